import type { Metadata } from "next";
import { SetPasswordForm } from "@/components/auth/set-password-form";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string; error?: string }> }) {
  const { token, error } = await searchParams;
  return (
    <>
      <h1 className="text-2xl font-semibold tracking-tight">Choose a new password</h1>
      {!token || error ? (
        <p role="alert" className="mt-4 rounded-lg bg-danger-soft px-3 py-3 text-sm text-danger">
          This reset link is not valid any more (links work once, for one hour). Ask for a new one from the sign-in page.
        </p>
      ) : (
        <SetPasswordForm mode="reset" token={token} />
      )}
    </>
  );
}
