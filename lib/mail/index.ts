/**
 * Outgoing e-mail. Every message is stored in the `outbox` table; when SMTP_URL is set it is also
 * delivered through nodemailer and marked sent. Without SMTP the outbox is the mailbox, viewable on
 * the development-only page /dev/outbox. Server only (`import "server-only"`); templates.ts is pure.
 */
import "server-only";
import { eq } from "drizzle-orm";
import nodemailer, { type Transporter } from "nodemailer";
import { db as sharedDb, type Db } from "../../db";
import { outbox } from "../../db/schema";
import { readEnv } from "../env";

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
  /** The studio the mail belongs to (null for account mail such as password resets). */
  studioId?: string | null;
}

export interface SentMail {
  id: string;
  delivered: boolean;
  /** Why SMTP delivery failed; the message stays in the outbox unsent. */
  error?: string;
}

let cached: { url: string; transport: Transporter } | null = null;

function smtpTransport(url: string): Transporter {
  if (!cached || cached.url !== url) cached = { url, transport: nodemailer.createTransport(url) };
  return cached.transport;
}

/**
 * Stores the message in the outbox and, when SMTP_URL is configured, sends it.
 * @example
 *   await sendMail({ to: "student@example.test", subject: "Your drill sheet", text: "…", studioId });
 */
export async function sendMail(message: MailMessage, database: Db = sharedDb): Promise<SentMail> {
  const env = readEnv();
  const id = crypto.randomUUID();
  await database.insert(outbox).values({
    id,
    studioId: message.studioId ?? null,
    to: message.to,
    subject: message.subject,
    text: message.text,
    html: message.html ?? null,
  });
  if (!env.SMTP_URL) return { id, delivered: false };
  // The rows the mail belongs to are already stored: a failed delivery is reported, never thrown,
  // so a retry by the teacher cannot store them twice.
  try {
    await smtpTransport(env.SMTP_URL).sendMail({
      from: env.MAIL_FROM,
      to: message.to,
      subject: message.subject,
      text: message.text,
      html: message.html,
    });
  } catch (error) {
    return { id, delivered: false, error: error instanceof Error ? error.message : String(error) };
  }
  await database.update(outbox).set({ sentAt: new Date() }).where(eq(outbox.id, id));
  return { id, delivered: true };
}

export { invitationMail, assignmentMail, resetPasswordMail } from "./templates";
