"use client";
// A plain POST to the sign-in service's sign-out route through callApi: every page shows this button,
// and the sign-in client library would add its weight to every page's first load for this one call.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { callApi } from "@/lib/client/api";

export function SignOutButton({ className = "" }: { className?: string }) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  return (
    <button
      type="button"
      className={className}
      title={problem ?? undefined}
      onClick={async () => {
        const res = await callApi("POST", "/api/auth/sign-out", { json: {}, fallback: "Could not sign out. Try again." });
        setProblem(res.ok ? null : res.message);
        if (!res.ok) return;
        router.replace("/sign-in");
        router.refresh();
      }}
    >
      {problem ? "Sign out (try again)" : "Sign out"}
    </button>
  );
}
