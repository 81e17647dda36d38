import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { config } from "@/lib/config";

// One transport per process; SMTP_URL points at the mail fake here and at a relay in production.
let transporter: Transporter | undefined;

function transport(): Transporter {
  transporter ??= nodemailer.createTransport(config().SMTP_URL, { from: config().MAIL_FROM });
  return transporter;
}

export type Letter = { to: string; subject: string; text: string; html?: string };

export async function sendMail(letter: Letter): Promise<void> {
  await transport().sendMail({ from: config().MAIL_FROM, ...letter });
}

export async function mailHealth(): Promise<void> {
  await transport().verify();
}
