import { z } from "zod";
import { ROLES } from "@/db/schema/shops";
import { signUpSchema } from "./auth";

export const forgotPasswordSchema = z.strictObject({ email: signUpSchema.shape.email });

export const resetPasswordSchema = z
  .strictObject({ password: signUpSchema.shape.password, confirmPassword: z.string() })
  .refine((v) => v.password === v.confirmPassword, { message: "The two passwords differ.", path: ["confirmPassword"] });

export const invitationInputSchema = z.strictObject({ email: signUpSchema.shape.email, role: z.enum(ROLES, { error: "Choose a role." }) });

export const inviteSignUpSchema = signUpSchema.pick({ displayName: true, password: true });
