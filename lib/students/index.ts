/**
 * Students: joining a studio by invitation, and a drill's stretch measured again for one student's
 * hand. Server only (`import "server-only"`).
 *
 * - invitations.ts: create an invitation (the link's token is stored only as a hash) and accept it,
 *   creating the student and the membership in one transaction
 * - span.ts (pure): a stored drill's spans and warnings for a student's hand profile
 */
import "server-only";

export * from "./invitations";
export * from "./span";
