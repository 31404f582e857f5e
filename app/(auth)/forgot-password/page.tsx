"use client";
import Link from "next/link";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { authClient } from "@/lib/auth/client";
import { emailSchema } from "@/lib/validation/account";
import { ErrorSummary } from "@/components/ui/error-summary";

export default function ForgotPasswordPage() {
  const [error, setError] = useState<string>();
  const [sent, setSent] = useState(false);
  const [pending, setPending] = useState(false);

  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const parsed = emailSchema.safeParse(new FormData(e.currentTarget).get("email"));
    if (!parsed.success) return setError(parsed.error.issues[0].message);
    setError(undefined);
    setPending(true);
    const { error: err } = await authClient.requestPasswordReset({ email: parsed.data, redirectTo: "/reset-password" });
    setPending(false);
    if (err)
      return setError(err.status === 429 ? "Too many requests. Wait a minute and try again." : "The request could not be sent. Try again.");
    setSent(true);
  }

  return (
    <>
      <h1 className="text-2xl font-semibold tracking-tight">Reset your password</h1>
      {sent ? (
        <p role="status" className="mt-4 rounded-lg bg-ok-soft px-3 py-3 text-sm text-ok">
          If an account uses that address, an e-mail with a reset link is on its way. The link works for one hour.
        </p>
      ) : (
        <form onSubmit={onSubmit} noValidate className="mt-6 flex flex-col gap-4">
          <ErrorSummary errors={{ email: error ?? undefined }} />
          <Field label="E-mail" htmlFor="email" error={error}>
            <Input id="email" name="email" type="email" autoComplete="username" aria-invalid={!!error} />
          </Field>
          <Button type="submit" size="lg" disabled={pending}>
            {pending ? "Sending…" : "Send reset link"}
          </Button>
        </form>
      )}
      <Link href="/sign-in" className="mt-6 block text-center text-sm text-muted hover:text-ink">
        Back to sign-in
      </Link>
    </>
  );
}
