/** The texts of Knotwork's e-mails: plain text first, with a small HTML twin. */

export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

const escapeHtml = (s: string) =>
  s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");

function content(subject: string, paragraphs: string[], link: { href: string; label: string }): MailContent {
  const text = [...paragraphs, `${link.label}: ${link.href}`, "— Knotwork"].join("\n\n");
  const html =
    paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join("") +
    `<p><a href="${escapeHtml(link.href)}">${escapeHtml(link.label)}</a></p><p>— Knotwork</p>`;
  return { subject, text, html };
}

/** The invitation a teacher sends to a new student. */
export function invitationMail(input: { studioName: string; teacherName: string; link: string; expiresAt: Date }): MailContent {
  return content(
    `${input.teacherName} invites you to ${input.studioName}`,
    [
      `${input.teacherName} has invited you to ${input.studioName} on Knotwork, where your drill sheets and practice log live.`,
      `Follow the link to choose your name and a password. The link works once and expires on ${input.expiresAt.toISOString().slice(0, 10)}.`,
    ],
    { href: input.link, label: "Join the studio" },
  );
}

/** The note a student gets when a drill sheet is assigned. */
export function assignmentMail(input: { studentName: string; sheetTitle: string; teacherName: string; dueDate: string | null; link: string }): MailContent {
  const due = input.dueDate ? ` It is due on ${input.dueDate}.` : "";
  return content(
    `New drill sheet: ${input.sheetTitle}`,
    [`Hello ${input.studentName}, ${input.teacherName} has given you the drill sheet "${input.sheetTitle}".${due}`, "Open it to see the drills, the tempo goals and to log your practice."],
    { href: input.link, label: "Open the drill sheet" },
  );
}

/** The password-reset link better-auth asks us to send. */
export function resetPasswordMail(input: { name: string; link: string }): MailContent {
  return content(
    "Reset your Knotwork password",
    [`Hello ${input.name}, someone (hopefully you) asked to reset your Knotwork password.`, "If it was not you, ignore this mail: your password stays as it is."],
    { href: input.link, label: "Choose a new password" },
  );
}
