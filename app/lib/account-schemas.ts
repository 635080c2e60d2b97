import { z } from "zod";

/** Form and API schemas for accounts, shared by browser and server. */

export const emailField = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .max(254, "An e-mail address has at most 254 characters.")
  .pipe(z.email({ error: "Enter a valid e-mail address." }));

export const signInSchema = z.object({
  email: emailField,
  password: z.string({ error: "Enter your password." }).max(1000),
  redirectTo: z.string().optional(),
});

export const passwordMinimum = 10;

export const newPasswordSchema = z
  .object({
    token: z.string({ error: "The link is incomplete." }),
    password: z
      .string({ error: "Choose a password." })
      .min(passwordMinimum, `Use at least ${passwordMinimum} characters.`)
      .max(200, "Use at most 200 characters."),
    confirmPassword: z.string({ error: "Type the password again." }),
  })
  .refine((value) => value.password === value.confirmPassword, {
    path: ["confirmPassword"],
    message: "The two passwords differ.",
  });

export const forgotPasswordSchema = z.object({ email: emailField });

/** Only same-site paths may be redirected to after sign-in. */
export function safeRedirectPath(value: string | null | undefined): string {
  if (
    !value ||
    !value.startsWith("/") ||
    value.startsWith("//") ||
    value.startsWith("/\\")
  ) {
    return "/";
  }
  return value;
}

/** The one answer to a failed sign-in, whatever the cause (no account enumeration). */
export const wrongCredentialsMessage = "E-mail or password is wrong.";
