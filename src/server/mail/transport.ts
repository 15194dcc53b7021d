import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { serverEnv } from "@/server/env";

const globalForMail = globalThis as unknown as { heterolaneMail?: Transporter };

function transporter(): Transporter {
  if (globalForMail.heterolaneMail) return globalForMail.heterolaneMail;
  const url = new URL(serverEnv().SMTP_URL);
  const local = url.hostname === "127.0.0.1" || url.hostname === "localhost";
  const t = nodemailer.createTransport({
    host: url.hostname,
    port: Number(url.port || (url.protocol === "smtps:" ? 465 : 587)),
    secure: url.protocol === "smtps:",
    // The local mail catcher speaks plain SMTP only.
    ignoreTLS: local,
    ...(url.username
      ? { auth: { user: decodeURIComponent(url.username), pass: decodeURIComponent(url.password) } }
      : {}),
  });
  globalForMail.heterolaneMail = t;
  return t;
}

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

export async function sendMail(mail: OutgoingMail): Promise<void> {
  await transporter().sendMail({ from: serverEnv().MAIL_FROM, ...mail });
}
