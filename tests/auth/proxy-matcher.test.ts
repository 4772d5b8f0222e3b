import { readdirSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { config } from "@/proxy";

const appDir = path.resolve(__dirname, "../../app");

/** Top-level URL folders of a route group, e.g. app/(teacher)/pieces → "pieces". */
function folders(group: string): string[] {
  const dir = path.join(appDir, group);
  return readdirSync(dir).filter((name) => statSync(path.join(dir, name)).isDirectory());
}

describe("proxy matcher", () => {
  test.each(["(teacher)", "(student)"])("every member page folder of %s is redirected early when signed out", (group) => {
    const found = folders(group);
    expect(found.length).toBeGreaterThan(0);
    for (const folder of found) expect(config.matcher).toContain(`/${folder}/:path*`);
  });
});
