// Input rules for sign-in, invitations, password setting and role changes (server and client alike).
import { z } from "@/lib/validation/zod";
import { ROLES } from "@/lib/auth/permissions";

export const PASSWORD_MIN = 10;

export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, "Keep the e-mail address under 254 characters.")
  .email("Enter a valid e-mail address, like name@railway.example.");
export const passwordSchema = z
  .string()
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters for the password.`)
  .max(128, "Use at most 128 characters for the password.");

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, "Enter your password.").max(128, "Passwords are at most 128 characters."),
});

export const roleSchema = z.enum(ROLES, { message: `Role must be one of: ${ROLES.join(", ")}.` });

export const inviteSchema = z.object({
  email: emailSchema,
  name: z.string().trim().min(2, "Enter the person's name.").max(120, "Keep the name under 120 characters."),
  role: roleSchema,
  siteId: z.string().uuid("Choose a site from the list.").nullable().optional(),
});

export const acceptInvitationSchema = z.object({
  token: z
    .string()
    .min(20, "This invitation link is incomplete; open it again from the e-mail.")
    .max(200, "This invitation link is not one of ours; open it again from the e-mail."),
  password: passwordSchema,
});

export const changeRoleSchema = z.object({ role: roleSchema });
