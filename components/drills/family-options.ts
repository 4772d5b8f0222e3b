/**
 * Form fields from a family's options schema, via zod 4's JSON Schema output: numbers become number
 * inputs (with min/max), enums selects, booleans checkboxes and arrays of an enum checkbox groups.
 */
export interface FamilyInfo {
  id: string;
  label: string;
  describe: string;
  /** `z.toJSONSchema(family.options, { io: "input" })`, computed on the server. */
  schema: JsonSchema;
}

export interface JsonSchema {
  type?: string | string[];
  properties?: Record<string, JsonSchema>;
  enum?: unknown[];
  items?: JsonSchema;
  default?: unknown;
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  exclusiveMaximum?: number;
  description?: string;
  anyOf?: JsonSchema[];
}

export type OptionField =
  | { kind: "number"; name: string; label: string; integer: boolean; min?: number; max?: number; value: number | undefined; hint?: string }
  | { kind: "enum"; name: string; label: string; choices: string[]; value: string; hint?: string }
  | { kind: "boolean"; name: string; label: string; value: boolean; hint?: string }
  | { kind: "multi"; name: string; label: string; choices: string[]; value: string[]; hint?: string };

/** "groupBy" → "Group by", "max-cells" → "Max cells". */
export function humanise(name: string): string {
  const words = name.replace(/([a-z])([A-Z])/g, "$1 $2").replace(/[-_]/g, " ").toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

function plain(s: JsonSchema): JsonSchema {
  const branch = s.anyOf?.find((b) => b.type !== "null");
  return branch ? { ...branch, default: s.default ?? branch.default, description: s.description ?? branch.description } : s;
}

/** The fields of one family's form, with current values (given options over schema defaults). */
export function optionFields(schema: JsonSchema, current: Record<string, unknown> = {}): OptionField[] {
  const fields: OptionField[] = [];
  for (const [name, raw] of Object.entries(schema.properties ?? {})) {
    const s = plain(raw);
    const label = humanise(name);
    const hint = s.description;
    const value = current[name] ?? s.default;
    const type = Array.isArray(s.type) ? s.type.find((t) => t !== "null") : s.type;
    if (s.enum && s.enum.every((e) => typeof e === "string")) {
      fields.push({ kind: "enum", name, label, choices: s.enum as string[], value: String(value ?? s.enum[0]), hint });
    } else if (type === "number" || type === "integer") {
      fields.push({
        kind: "number",
        name,
        label,
        integer: type === "integer",
        min: s.minimum ?? s.exclusiveMinimum,
        max: s.maximum ?? s.exclusiveMaximum,
        value: typeof value === "number" ? value : undefined,
        hint,
      });
    } else if (type === "boolean") {
      fields.push({ kind: "boolean", name, label, value: Boolean(value), hint });
    } else if (type === "array" && s.items?.enum?.every((e) => typeof e === "string")) {
      fields.push({ kind: "multi", name, label, choices: s.items.enum as string[], value: Array.isArray(value) ? (value as string[]) : [], hint });
    }
  }
  return fields;
}
