import path from "node:path";
import type { Page } from "playwright-core";
import { repoRoot } from "./server";

/** One axe-core rule that failed, with the first few offending elements. */
export interface AxeViolation {
  id: string;
  impact: "minor" | "moderate" | "serious" | "critical" | null;
  help: string;
  targets: string[];
}

const AXE_SCRIPT = path.join(repoRoot, "node_modules/axe-core/axe.min.js");

/**
 * Injects axe-core (from node_modules, no network) into the page and runs it on the whole document.
 * Returns the serious and critical violations only; `minor`/`moderate` are left to review.
 * Run after the page has settled (engraving done, dialogs open as intended).
 */
export async function seriousViolations(page: Page, options: { exclude?: string[] } = {}): Promise<AxeViolation[]> {
  const loaded = await page.evaluate(() => typeof (window as unknown as { axe?: unknown }).axe !== "undefined");
  if (!loaded) await page.addScriptTag({ path: AXE_SCRIPT });
  const results = await page.evaluate(async (exclude: string[]) => {
    const axe = (window as unknown as { axe: { run(ctx: unknown, opts: unknown): Promise<{ violations: RawViolation[] }> } }).axe;
    type RawViolation = { id: string; impact: string | null; help: string; nodes: { target: unknown[] }[] };
    const context = exclude.length > 0 ? { include: [document], exclude: exclude.map((s) => [s]) } : document;
    const r = await axe.run(context, { resultTypes: ["violations"] });
    return r.violations.map((v) => ({
      id: v.id,
      impact: v.impact,
      help: v.help,
      targets: v.nodes.slice(0, 5).map((n) => n.target.map(String).join(" ")),
    }));
  }, options.exclude ?? []);
  return (results as AxeViolation[]).filter((v) => v.impact === "serious" || v.impact === "critical");
}

/** A readable one-line-per-rule summary for assertion messages. */
export function describeViolations(violations: AxeViolation[]): string {
  return violations.map((v) => `${v.impact} ${v.id}: ${v.help} → ${v.targets.join(", ")}`).join("\n");
}
