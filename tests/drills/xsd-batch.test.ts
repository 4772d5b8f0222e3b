// The batch check agrees with the single-document check (tests/support/xmllint.ts) on a valid and an invalid document.
import { describe, expect, test } from "vitest";
import { writeMusicXML } from "../../lib/score";
import { generateDrills } from "../../lib/drills";
import { makePassage } from "../../lib/drills/test-passages";
import { hasXmllint, validateMusicXml } from "../support/xmllint";
import { validateAll } from "./xsd-batch";

describe.runIf(hasXmllint())("validateAll", () => {
  test("a valid drill passes, a document with an element the MusicXML 4.0 XSD does not allow fails, like the single check", () => {
    const drill = generateDrills(makePassage({ right: "C4/4 E4/4 G4/4 E4/4" }), { families: ["tempo-ladder"] }).drills[0]!;
    const good = writeMusicXML(drill.score);
    const bad = good.replace("<part-list>", "<part-list><no-such-element/>");
    const [a, b] = validateAll([good, bad]);
    expect(a).toEqual(validateMusicXml(good).errors);
    expect(a).toEqual([]);
    expect(b!.length).toBeGreaterThan(0);
    expect(validateMusicXml(bad).valid).toBe(false);
  });
});
