import { describe, expect, test } from "vitest";
import { fileStem } from "./files";

describe("fileStem", () => {
  test("accents fold to ASCII letters, punctuation goes, words join with one hyphen", () => {
    // NFKD splits "É" into "E" and a combining accent (Unicode Standard Annex #15, from memory).
    expect(fileStem("Étude — No. 3")).toBe("etude-no-3");
    expect(fileStem("  Left hand:  even_triplets  ")).toBe("left-hand-even-triplets");
  });

  test("no hyphen at either end, even when cut at 60 characters", () => {
    expect(fileStem("- Scales -")).toBe("scales");
    const stem = fileStem(`${"a".repeat(59)} b`);
    expect(stem).toBe("a".repeat(59));
    expect(fileStem("ab ".repeat(40)).length).toBeLessThanOrEqual(60);
  });

  test("a title with nothing usable gets the fallback", () => {
    expect(fileStem("♪♪ —")).toBe("drill");
    expect(fileStem("", "drill-sheet")).toBe("drill-sheet");
  });
});
