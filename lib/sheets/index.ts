/**
 * Drill sheets: what saving a sheet accepts and the rows it becomes, and who may read a sheet and
 * its downloads. Server only (`import "server-only"`).
 *
 * - save.ts: the save request (knot, generate request, picked drills) and the sheet rows (no db access)
 * - access.ts: `canReadSheet`, a teacher of the studio or a student with the sheet assigned
 */
import "server-only";

export * from "./access";
export * from "./save";
