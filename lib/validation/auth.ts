import { z } from "zod";
import { PASSWORD_MAX, PASSWORD_MIN, passwordProblem } from "@/lib/auth/password-rules";

const email = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .min(1, "Enter your e-mail address.")
  .max(254, "That e-mail address is too long.")
  .pipe(z.email("Enter a valid e-mail address, like name@example.com."));

const newPassword = z
  .string({ error: "Choose a password." })
  .superRefine((value, ctx) => {
    const problem = passwordProblem(value);
    if (problem) ctx.addIssue({ code: "custom", message: problem });
  });

export const signUpSchema = z.strictObject({
  displayName: z.string().trim().min(1, "Tell us your name.").max(80, "Use at most 80 characters."),
  email,
  password: newPassword,
});

export const signInSchema = z.strictObject({
  email: z.string().trim().min(1, "Enter your e-mail address.").max(254),
  password: z.string().min(1, "Enter your password.").max(PASSWORD_MAX * 4),
});

export const changePasswordSchema = z
  .strictObject({
    currentPassword: z.string().min(1, "Enter your current password.").max(PASSWORD_MAX * 4),
    newPassword,
    confirmPassword: z.string(),
  })
  .refine((v) => v.newPassword === v.confirmPassword, {
    message: "The two new passwords differ.",
    path: ["confirmPassword"],
  });

export { PASSWORD_MIN, PASSWORD_MAX };
