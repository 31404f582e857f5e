"use client";
// A plain POST to the sign-in service's sign-out route: every page shows this button, and the sign-in
// client library would add its weight to every page's first load for this one call.
import { useRouter } from "next/navigation";
import { useState } from "react";

export function SignOutButton({ className = "" }: { className?: string }) {
  const router = useRouter();
  const [failed, setFailed] = useState(false);
  return (
    <button
      type="button"
      className={className}
      onClick={async () => {
        const ok = await fetch("/api/auth/sign-out", { method: "POST", headers: { "content-type": "application/json" }, body: "{}", signal: AbortSignal.timeout(15_000) })
          .then((r) => r.ok, () => false);
        setFailed(!ok);
        if (!ok) return;
        router.replace("/sign-in");
        router.refresh();
      }}
    >
      {failed ? "Sign out (try again)" : "Sign out"}
    </button>
  );
}
