/**
 * Who knocks on the doors in the hardening suite, and what must never show up in a refused answer.
 */
import { DEMO_PASSWORD, DEMO_STUDENTS, DEMO_STUDIO, DEMO_TEACHER } from "../../lib/demo/seed";

export const OTHER_TEACHER = { name: "Perpetua Okonkwo-Vale", email: "perpetua@elsewhere.test", studioName: "Quillmere Studio" };
export const OTHER_STUDENT = { name: "Ilse Marrowby", email: "ilse@elsewhere.test" };
export const SEEDED_SHEET_TITLE = "Marigold triplet evenness sheet";

/** Ids of the demo studio (and the other studio's id), written by seed-studios.ts. */
export interface SeedIds {
  studioId: string;
  scoreId: string;
  passageId: string;
  sheetId: string;
  sheetDrillId: string;
  assignmentId: string;
  practiceEntryId: string;
  studentMembershipId: string;
  /** A demo student with no assignment. */
  secondStudentMembershipId: string;
  invitationId: string;
  invitationToken: string;
  otherStudioId: string;
  pieceTitles: string[];
  drillKeys: string[];
}

export type PersonaName = "demoTeacher" | "demoStudent" | "demoOtherStudent" | "otherTeacher" | "otherStudent";

export const PERSONA_LOGINS: Record<PersonaName, { email: string; password: string }> = {
  demoTeacher: { email: DEMO_TEACHER.email, password: DEMO_PASSWORD },
  demoStudent: { email: DEMO_STUDENTS[0].email, password: DEMO_PASSWORD },
  demoOtherStudent: { email: DEMO_STUDENTS[1].email, password: DEMO_PASSWORD },
  otherTeacher: { email: OTHER_TEACHER.email, password: DEMO_PASSWORD },
  otherStudent: { email: OTHER_STUDENT.email, password: DEMO_PASSWORD },
};

/** Cookie header per persona ("" = anonymous). */
export type Cookies = Record<PersonaName | "anonymous", string>;

/** Signs in over HTTP (better-auth's e-mail endpoint) and returns the Cookie header to send. */
export async function signIn(baseURL: string, email: string, password: string): Promise<string> {
  const res = await fetch(`${baseURL}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: baseURL },
    body: JSON.stringify({ email, password }),
  });
  if (!res.ok) throw new Error(`sign-in for ${email} answered ${res.status}: ${await res.text()}`);
  const cookies = res.headers.getSetCookie().map((c) => c.split(";")[0]);
  const session = cookies.filter((c) => c.includes("session_token"));
  if (session.length === 0) throw new Error(`sign-in for ${email} set no session cookie`);
  return cookies.join("; ");
}

/**
 * Strings of the demo studio that a refused answer must not contain: piece titles, the seeded
 * sheet's title, the knot note, member names and e-mails, the studio name and its ids.
 */
export function leakMarkers(ids: SeedIds): string[] {
  return [
    DEMO_STUDIO,
    DEMO_TEACHER.name,
    DEMO_TEACHER.email,
    ...DEMO_STUDENTS.flatMap((s) => [s.name, s.email]),
    SEEDED_SHEET_TITLE,
    "Triplets rush after the thumb",
    "Bar two still uneven",
    "Slow hands, quiet wrist",
    ...ids.pieceTitles,
  ];
}

/** The markers found in a body (empty when nothing leaked). */
export function leaksIn(body: string, markers: readonly string[]): string[] {
  const lower = body.toLowerCase();
  return markers.filter((m) => m && lower.includes(m.toLowerCase()));
}
