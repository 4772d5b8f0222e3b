// A drill's stretch checked against the hand of the student who gets it: the same stored drill
// (a tenth, C4 held while E5 is struck) warns a 178 mm hand on the sheet page and in the handout,
// and stays quiet for a 216 mm hand.
import { afterAll, beforeAll, describe, expect, test, vi } from "vitest";
import { keyDistanceMm, spanLimits } from "@/lib/drills/hand";
import { useTempDatabase } from "../db/temp-db";
import { readPdfPages, squash } from "../handout/pdf-tools";
import { buildStudio, cookieFor, PASSWORDS, type StudioFixture } from "./studio-fixture";

const request = vi.hoisted(() => ({ headers: new Headers() }));
vi.mock("next/headers", () => ({
  headers: async () => request.headers,
  cookies: async () => ({ get: () => undefined, getAll: () => [], set: () => undefined, delete: () => undefined }),
}));

/**
 * One right-hand bar: C4 held a whole note (voice 1) while voice 2 rests a beat, then strikes E5.
 * MusicXML 4.0: <backup> moves back to the bar start so the second voice sounds under the first.
 */
const HELD_TENTH = `<?xml version="1.0" encoding="UTF-8"?>
<score-partwise version="4.0"><part-list><score-part id="P1"><part-name>Piano</part-name></score-part></part-list>
<part id="P1"><measure number="1"><attributes><divisions>1</divisions><time><beats>4</beats><beat-type>4</beat-type></time>
<clef><sign>G</sign><line>2</line></clef></attributes>
<note><pitch><step>C</step><octave>4</octave></pitch><duration>4</duration><voice>1</voice><type>whole</type></note>
<backup><duration>4</duration></backup>
<note><rest/><duration>1</duration><voice>2</voice><type>quarter</type></note>
<note><pitch><step>E</step><octave>5</octave></pitch><duration>1</duration><voice>2</voice><type>quarter</type></note>
<note><rest/><duration>2</duration><voice>2</voice><type>half</type></note>
</measure></part></score-partwise>`;

const SMALL = { spanMm: 178, octaveMm: 165.1 };
const LARGE = { spanMm: 216, octaveMm: 165.1 };
const TITLE = "Held C, reach for E";

let t: Awaited<ReturnType<typeof useTempDatabase>>;
let f: StudioFixture;
let sheetId = "";
let assignments: string[] = [];

beforeAll(async () => {
  t = await useTempDatabase("span-for-student");
  f = await buildStudio(t.db, "span");
  const { handProfile } = await import("@/db/schema");
  await t.db.insert(handProfile).values([
    { membershipId: f.students[0].membershipId, ...SMALL },
    { membershipId: f.students[1].membershipId, ...LARGE },
  ]);
  const { saveSheet } = await import("@/db/queries/sheets");
  const { createAssignments } = await import("@/db/queries/assignments");
  // Saved as generated for the large hand: no span warning and no over flags in its meta.
  sheetId = await saveSheet(t.db, {
    studioId: f.studioId, createdBy: f.teacherUserId, passageId: null, title: "Reach sheet",
    drills: [{
      family: "held-tone", variant: "plain", title: TITLE, teacherNote: "", studentNote: "Hold the C.", musicxml: HELD_TENTH,
      meta: { hands: "right", warnings: [], warningCodes: [], profile: LARGE, maxSpan: { right: { semitones: 16, mm: 212, overComfortable: false, overPractical: false } }, tempo: { start: 50, target: 70 } },
    }],
  });
  assignments = await createAssignments(t.db, {
    studioId: f.studioId, sheetId, studentMembershipIds: f.students.map((s) => s.membershipId),
    dueDate: "2099-01-01", tempoGoals: {}, note: null, createdBy: f.teacherUserId,
  });
});
afterAll(() => t?.cleanup());

describe("the limits the test relies on", () => {
  test("a tenth C4–E5 is over 178 mm and within 216 mm (FACTS.md §1: 212.3 mm centre to centre)", () => {
    const tenth = keyDistanceMm(60, 76);
    expect(tenth).toBeCloseTo(212.3, 1); // FACTS.md §1
    // hand.ts spanLimits: comfortable is the profile's spanMm; overComfortable is mm > comfortable.
    expect(tenth).toBeGreaterThan(spanLimits(SMALL).comfortable);
    expect(tenth).toBeLessThan(spanLimits(LARGE).comfortable);
  });
});

describe("student sheet page data", () => {
  test("the 178 mm student sees the tenth flagged for their span", async () => {
    const { loadStudentSheet } = await import("../../app/(student)/my/assignments/[assignmentId]/student-sheet-data");
    const data = await loadStudentSheet(t.db, f.studioId, assignments[0]!, f.students[0].membershipId);
    const d = data!.drills.find((x) => x.title === TITLE)!;
    expect(d.spanWarnings).toHaveLength(1);
    expect(d.spanWarnings[0]).toContain("RH 16 semitones / 212 mm");
    expect(d.spanWarnings[0]).toContain("178 mm");
  });

  test("the 216 mm student sees no span warning for the same drill", async () => {
    const { loadStudentSheet } = await import("../../app/(student)/my/assignments/[assignmentId]/student-sheet-data");
    const data = await loadStudentSheet(t.db, f.studioId, assignments[1]!, f.students[1].membershipId);
    expect(data!.drills.find((x) => x.title === TITLE)!.spanWarnings).toEqual([]);
  });

  test("another student's assignment is not readable", async () => {
    const { loadStudentSheet } = await import("../../app/(student)/my/assignments/[assignmentId]/student-sheet-data");
    expect(await loadStudentSheet(t.db, f.studioId, assignments[0]!, f.students[1].membershipId)).toBeNull();
  });
});

describe("handout text (read with pdfjs-dist)", () => {
  let route: typeof import("../../app/api/sheets/[sheetId]/handout/route");
  async function pdfText(cookie: string, query = ""): Promise<string> {
    request.headers = new Headers({ cookie });
    const res = await route.GET(new Request(`http://localhost:3000/api/sheets/${sheetId}/handout${query}`), { params: Promise.resolve({ sheetId }) });
    expect(res.status).toBe(200);
    return squash((await readPdfPages(new Uint8Array(await res.arrayBuffer()))).map((p) => p.text).join(" "));
  }
  beforeAll(async () => {
    route = await import("../../app/api/sheets/[sheetId]/handout/route");
  });

  test("the 178 mm student's own copy carries the whole warning", async () => {
    const text = await pdfText(await cookieFor(f.students[0].email, PASSWORDS.student));
    expect(text).toContain(squash("RH 16 semitones / 212 mm"));
    expect(text).toContain(squash("ask your teacher for another fingering."));
  });

  test("the teacher printing the 178 mm student's assignment gets the warning too; the 216 mm one's has none", async () => {
    const teacher = await cookieFor(`ada-span@knotwork.test`, PASSWORDS.teacher);
    expect(await pdfText(teacher, `?assignment=${assignments[0]}`)).toContain(squash("RH 16 semitones / 212 mm"));
    expect(await pdfText(teacher, `?assignment=${assignments[1]}`)).not.toContain(squash("semitones"));
  });

  test("the 216 mm student's own copy has no span warning", async () => {
    const text = await pdfText(await cookieFor(f.students[1].email, PASSWORDS.student));
    expect(text).not.toContain(squash("semitones"));
  });
});

describe("assign form: drills too wide per student", () => {
  test("the tenth is listed for the 178 mm student only; a student with no profile is checked against the default hand", async () => {
    const { getSheet } = await import("@/db/queries/sheets");
    const { overSpanByStudent } = await import("../../app/(teacher)/assignments/student-fit");
    const sheet = await getSheet(t.db, f.studioId, sheetId);
    const fit = overSpanByStudent(sheet!.drills, [
      { membershipId: "small", ...SMALL },
      { membershipId: "large", ...LARGE },
      { membershipId: "none", spanMm: null, octaveMm: null },
    ]);
    expect(fit.small!.map((o) => o.label)).toEqual([`1. ${TITLE}`]);
    expect(fit.small![0]!.stretches).toEqual(["RH 16 semitones / 212 mm"]);
    expect(fit.large).toEqual([]);
    // hand.ts DEFAULT_PROFILE: the 7.9 in hand reaches a ninth at full stretch but not a tenth comfortably.
    expect(fit.none!.length).toBe(1);
  });
});
