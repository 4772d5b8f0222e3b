/**
 * The score engine's public surface: read MusicXML / .mxl into the exact model, clean uploads, cut
 * passages, merge ties, and write the model back out.
 *
 * @example
 * import * as Score from "@/lib/score";
 * const { score } = Score.readScore(bytes);
 * const knot = Score.selectPassage(score, { hand: "right", from: 0, to: 3 });
 */
export type * from "./types";
export { readScore, sanitizeScore, scoreText, type ReadResult, type ReadOptions } from "./read";
export { ScoreError, isScoreError, SCORE_ERROR_CODES, type ScoreErrorCode } from "./errors";
export { assertSafeXml, cleanXml, escapeXml, MAX_XML_CHARS } from "./sanitize";
export { isZip, listZip, unpackMxl, MXL_LIMITS } from "./mxl";
export { selectPassage, barIndex, barNumbers, sonorities, beatGroups, beatLength, figureGroups, type PassageRequest } from "./passage";
export { mergeTies } from "./ties";
export { partMeasure } from "./part-measure";
export { handsOfPart, pianoCandidates, pianoPart, type PianoCandidate } from "./parts";
export { q, fromDivisions, barLength, maxTime, compareTime, toQuarters, ZERO } from "./time";
export { midiOf, makePitch, pitchName, isStep, octaveShiftSemitones, STEP_SEMITONES } from "./pitch";
export * from "./write";
export * from "./performance";
export * from "./midi";
export { writeMxl } from "./write-mxl";
