"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { authClient } from "@/lib/auth/client";
import { passwordSchema, PASSWORD_MIN } from "@/lib/validation/account";
import { ErrorSummary } from "@/components/ui/error-summary";
import { sendJson } from "@/lib/client/api";

/** Sets a password from a reset link or an invitation link. */
export function SetPasswordForm({ mode, token }: { mode: "reset" | "invitation"; token: string }) {
  const router = useRouter();
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [pending, setPending] = useState(false);

  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const password = String(form.get("password") ?? "");
    const parsed = passwordSchema.safeParse(password);
    if (!parsed.success) return setErrors({ password: parsed.error.issues[0].message });
    if (password !== form.get("confirm")) return setErrors({ confirm: "The two passwords differ; type the same one twice." });
    setErrors({});
    setPending(true);
    let problem: string | undefined;
    if (mode === "reset") {
      const { error } = await authClient.resetPassword({ newPassword: password, token });
      if (error) problem = "This reset link is not valid any more. Ask for a new one from the sign-in page.";
    } else {
      const res = await sendJson("POST", "/api/invitations/accept", { token, password });
      if (!res.ok) problem = res.message;
    }
    setPending(false);
    if (problem) return setErrors({ form: problem });
    router.replace("/sign-in?welcome=1");
  }

  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 flex flex-col gap-4">
      <ErrorSummary errors={{ password: errors.password, confirm: errors.confirm }} />
      {errors.form ? (
        <p role="alert" className="rounded-lg bg-danger-soft px-3 py-2 text-sm text-danger">
          {errors.form}
        </p>
      ) : null}
      <Field label="New password" htmlFor="password" error={errors.password} hint={`At least ${PASSWORD_MIN} characters.`}>
        <Input id="password" name="password" type="password" autoComplete="new-password" aria-invalid={!!errors.password} />
      </Field>
      <Field label="Same password again" htmlFor="confirm" error={errors.confirm}>
        <Input id="confirm" name="confirm" type="password" autoComplete="new-password" aria-invalid={!!errors.confirm} />
      </Field>
      <Button type="submit" size="lg" disabled={pending}>
        {pending ? "Saving…" : mode === "reset" ? "Save new password" : "Set password and finish"}
      </Button>
    </form>
  );
}
