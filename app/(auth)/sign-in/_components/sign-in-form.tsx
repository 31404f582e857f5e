"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { authClient } from "@/lib/auth/client";
import { signInSchema } from "@/lib/validation/account";
import { ErrorSummary } from "@/components/ui/error-summary";

export function SignInForm() {
  const router = useRouter();
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [pending, setPending] = useState(false);

  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const parsed = signInSchema.safeParse({ email: form.get("email"), password: form.get("password") });
    if (!parsed.success) {
      const next: Record<string, string> = {};
      for (const issue of parsed.error.issues) next[String(issue.path[0])] ??= issue.message;
      setErrors(next);
      return;
    }
    setErrors({});
    setPending(true);
    const { error } = await authClient.signIn.email(parsed.data);
    setPending(false);
    if (error) {
      setErrors({
        form:
          error.status === 429
            ? (error.message ?? "Too many failed sign-ins. Wait a minute, then try again.")
            : error.status === 401 || error.code === "INVALID_EMAIL_OR_PASSWORD"
              ? "That e-mail and password do not match an account. Check both, or reset the password."
              : error.code === "BANNED_USER"
                ? "This account is suspended. Ask your Tearline administrator."
                : (error.message ?? "Sign-in failed. Try again."),
      });
      return;
    }
    router.replace("/");
    router.refresh();
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label="Sign in">
      <ErrorSummary errors={{ email: errors.email, password: errors.password }} />
      {errors.form ? (
        <p role="alert" className="rounded-lg bg-danger-soft px-3 py-2 text-sm text-danger">
          {errors.form}
        </p>
      ) : null}
      <Field label="E-mail" htmlFor="email" error={errors.email}>
        <Input id="email" name="email" type="email" autoComplete="username" inputMode="email" aria-invalid={!!errors.email} />
      </Field>
      <Field label="Password" htmlFor="password" error={errors.password}>
        <Input id="password" name="password" type="password" autoComplete="current-password" aria-invalid={!!errors.password} />
      </Field>
      <Button type="submit" size="lg" disabled={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </Button>
      <Link href="/forgot-password" className="text-center text-sm text-muted underline-offset-4 hover:text-ink hover:underline">
        Forgot your password?
      </Link>
    </form>
  );
}
