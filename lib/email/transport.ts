import "server-only";
import nodemailer, { type Transporter } from "nodemailer";

/**
 * SMTP settings from the environment. Locally the start and test commands run the SMTP fake on
 * 127.0.0.1:SMTP_PORT (default 2525); production sets SMTP_HOST, SMTP_PORT, SMTP_USER,
 * SMTP_PASSWORD, SMTP_SECURE and EMAIL_FROM.
 */
export function smtpSettings(env: NodeJS.ProcessEnv = process.env) {
  return {
    host: env.SMTP_HOST || "127.0.0.1",
    port: Number(env.SMTP_PORT || 2525),
    secure: env.SMTP_SECURE === "1",
    user: env.SMTP_USER || undefined,
    password: env.SMTP_PASSWORD || undefined,
    from: env.EMAIL_FROM || "Presswright <no-reply@presswright.invalid>",
  };
}

let cached: Transporter | null = null;

export function smtpTransport(): Transporter {
  if (cached) return cached;
  const s = smtpSettings();
  cached = nodemailer.createTransport({
    host: s.host,
    port: s.port,
    secure: s.secure,
    auth: s.user ? { user: s.user, pass: s.password ?? "" } : undefined,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
  return cached;
}
