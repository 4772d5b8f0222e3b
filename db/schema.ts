/**
 * Knotwork's tables. camelCase keys in TypeScript over snake_case columns; every row that belongs to
 * a studio carries `studioId`, and every studio or user key has an index.
 */
import { sql } from "drizzle-orm";
import { index, integer, real, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { user } from "./auth-schema";

export * from "./auth-schema";
export * from "./limits-schema";

const id = () =>
  text("id")
    .primaryKey()
    .$defaultFn(() => crypto.randomUUID());
const now = sql`(cast(unixepoch('subsecond') * 1000 as integer))`;
const createdAt = () => integer("created_at", { mode: "timestamp_ms" }).default(now).notNull();
const updatedAt = () =>
  integer("updated_at", { mode: "timestamp_ms" })
    .default(now)
    .$onUpdate(() => new Date())
    .notNull();

export const ROLES = ["teacher", "student"] as const;
export type Role = (typeof ROLES)[number];

export const studio = sqliteTable("studio", {
  id: id(),
  name: text("name").notNull(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

export const membership = sqliteTable(
  "membership",
  {
    id: id(),
    studioId: text("studio_id")
      .notNull()
      .references(() => studio.id, { onDelete: "cascade" }),
    userId: text("user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    role: text("role", { enum: ROLES }).notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex("membership_user_studio_uq").on(t.userId, t.studioId),
    index("membership_studio_idx").on(t.studioId),
    index("membership_user_idx").on(t.userId),
  ],
);

export const handProfile = sqliteTable(
  "hand_profile",
  {
    id: id(),
    membershipId: text("membership_id")
      .notNull()
      .unique()
      .references(() => membership.id, { onDelete: "cascade" }),
    /** Comfortable span from thumb to little finger, in millimetres. */
    spanMm: real("span_mm").notNull(),
    /** Width of one keyboard octave on the student's instrument, in millimetres. */
    octaveMm: real("octave_mm").notNull().default(165.1),
    notes: text("notes"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("hand_profile_membership_idx").on(t.membershipId)],
);

export const score = sqliteTable(
  "score",
  {
    id: id(),
    studioId: text("studio_id")
      .notNull()
      .references(() => studio.id, { onDelete: "cascade" }),
    title: text("title").notNull(),
    composer: text("composer"),
    bars: integer("bars").notNull(),
    /** Summary of the parts: [{ id, name, staves }]. */
    parts: text("parts", { mode: "json" }).$type<ScorePartSummary[]>().notNull(),
    /** The cleaned, re-serialised MusicXML: the only copy browsers and renderers get. */
    musicxml: text("musicxml").notNull(),
    storageKey: text("storage_key"),
    originalName: text("original_name"),
    uploadedBy: text("uploaded_by").references(() => user.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("score_studio_idx").on(t.studioId), index("score_uploaded_by_idx").on(t.uploadedBy)],
);

export interface ScorePartSummary {
  id: string;
  name: string;
  staves: number;
}

export const passage = sqliteTable(
  "passage",
  {
    id: id(),
    studioId: text("studio_id")
      .notNull()
      .references(() => studio.id, { onDelete: "cascade" }),
    scoreId: text("score_id")
      .notNull()
      .references(() => score.id, { onDelete: "cascade" }),
    part: text("part").notNull(),
    hand: text("hand", { enum: ["right", "left", "both"] }).notNull(),
    fromBar: integer("from_bar").notNull(),
    toBar: integer("to_bar").notNull(),
    tags: text("tags", { mode: "json" }).$type<string[]>().notNull().default([]),
    note: text("note"),
    createdBy: text("created_by").references(() => user.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("passage_studio_idx").on(t.studioId),
    index("passage_score_idx").on(t.scoreId),
    index("passage_created_by_idx").on(t.createdBy),
  ],
);

export const sheet = sqliteTable(
  "sheet",
  {
    id: id(),
    studioId: text("studio_id")
      .notNull()
      .references(() => studio.id, { onDelete: "cascade" }),
    passageId: text("passage_id").references(() => passage.id, { onDelete: "set null" }),
    title: text("title").notNull(),
    notes: text("notes"),
    createdBy: text("created_by").references(() => user.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("sheet_studio_idx").on(t.studioId),
    index("sheet_passage_idx").on(t.passageId),
    index("sheet_created_by_idx").on(t.createdBy),
  ],
);

/** A hand's widest stretch as saved with a drill; the flags are against `SheetDrillMeta.profile`. */
export interface SheetDrillSpan {
  semitones: number;
  mm: number;
  overComfortable?: boolean;
  overPractical?: boolean;
}

export interface SheetDrillMeta {
  maxSpan?: { right?: SheetDrillSpan; left?: SheetDrillSpan };
  /** The hand profile the drill was generated (and its span measured) for. */
  profile?: { spanMm: number; octaveMm: number };
  warnings?: string[];
  /** Per entry of `warnings`: its kind ("span", "range", …), so readers can tell span warnings apart. */
  warningCodes?: string[];
  tempo?: { start: number; target: number };
  hands?: "right" | "left" | "both";
  fingeringSource?: { score: number; estimated: number };
}

export const sheetDrill = sqliteTable(
  "sheet_drill",
  {
    id: id(),
    sheetId: text("sheet_id")
      .notNull()
      .references(() => sheet.id, { onDelete: "cascade" }),
    position: integer("position").notNull(),
    family: text("family").notNull(),
    variant: text("variant"),
    title: text("title").notNull(),
    teacherNote: text("teacher_note"),
    studentNote: text("student_note"),
    musicxml: text("musicxml").notNull(),
    meta: text("meta", { mode: "json" }).$type<SheetDrillMeta>().notNull().default({}),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("sheet_drill_sheet_idx").on(t.sheetId, t.position)],
);

export const assignment = sqliteTable(
  "assignment",
  {
    id: id(),
    studioId: text("studio_id")
      .notNull()
      .references(() => studio.id, { onDelete: "cascade" }),
    sheetId: text("sheet_id")
      .notNull()
      .references(() => sheet.id, { onDelete: "cascade" }),
    studentMembershipId: text("student_membership_id")
      .notNull()
      .references(() => membership.id, { onDelete: "cascade" }),
    dueDate: text("due_date"),
    /** Target tempo per sheet_drill id, in beats per minute. */
    tempoGoals: text("tempo_goals", { mode: "json" }).$type<Record<string, number>>().notNull().default({}),
    note: text("note"),
    createdBy: text("created_by").references(() => user.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("assignment_studio_idx").on(t.studioId),
    index("assignment_sheet_idx").on(t.sheetId),
    index("assignment_student_idx").on(t.studentMembershipId),
    index("assignment_created_by_idx").on(t.createdBy),
  ],
);

export const practiceEntry = sqliteTable(
  "practice_entry",
  {
    id: id(),
    studioId: text("studio_id")
      .notNull()
      .references(() => studio.id, { onDelete: "cascade" }),
    assignmentId: text("assignment_id")
      .notNull()
      .references(() => assignment.id, { onDelete: "cascade" }),
    studentMembershipId: text("student_membership_id")
      .notNull()
      .references(() => membership.id, { onDelete: "cascade" }),
    /** ISO date (YYYY-MM-DD) the student practised on. */
    practisedOn: text("practised_on").notNull(),
    minutes: integer("minutes").notNull(),
    /** Tempo reached per sheet_drill id, in beats per minute. */
    tempos: text("tempos", { mode: "json" }).$type<Record<string, number>>().notNull().default({}),
    /** 1 (hard) … 5 (easy). */
    ease: integer("ease").notNull(),
    comment: text("comment"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("practice_entry_studio_idx").on(t.studioId),
    index("practice_entry_assignment_idx").on(t.assignmentId),
    index("practice_entry_student_idx").on(t.studentMembershipId, t.practisedOn),
  ],
);

export const invitation = sqliteTable(
  "invitation",
  {
    id: id(),
    studioId: text("studio_id")
      .notNull()
      .references(() => studio.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    /** SHA-256 of the token sent by e-mail; the token itself is never stored. */
    tokenHash: text("token_hash").notNull().unique(),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    acceptedAt: integer("accepted_at", { mode: "timestamp_ms" }),
    invitedBy: text("invited_by").references(() => user.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("invitation_studio_idx").on(t.studioId),
    index("invitation_invited_by_idx").on(t.invitedBy),
    index("invitation_email_idx").on(t.email),
  ],
);

export const outbox = sqliteTable(
  "outbox",
  {
    id: id(),
    studioId: text("studio_id").references(() => studio.id, { onDelete: "cascade" }),
    to: text("to").notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html"),
    createdAt: createdAt(),
    sentAt: integer("sent_at", { mode: "timestamp_ms" }),
  },
  (t) => [index("outbox_studio_idx").on(t.studioId), index("outbox_sent_idx").on(t.sentAt)],
);

export type Studio = typeof studio.$inferSelect;
export type Membership = typeof membership.$inferSelect;
export type HandProfile = typeof handProfile.$inferSelect;
export type ScoreRow = typeof score.$inferSelect;
export type PassageRow = typeof passage.$inferSelect;
export type SheetRow = typeof sheet.$inferSelect;
export type SheetDrillRow = typeof sheetDrill.$inferSelect;
export type AssignmentRow = typeof assignment.$inferSelect;
export type PracticeEntryRow = typeof practiceEntry.$inferSelect;
export type InvitationRow = typeof invitation.$inferSelect;
export type OutboxRow = typeof outbox.$inferSelect;
