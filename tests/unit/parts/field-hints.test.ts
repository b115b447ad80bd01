import { describe, expect, it } from "vitest";
import { FIELD_HINTS, KIND_DEFINITIONS, PART_KINDS, placeholderText, type FieldDef } from "@/lib/parts";
import { parseQuantity } from "@/lib/units";

// Placeholders per field: each example is a value the field itself accepts, and it is shown
// as an example ("e.g. …") so an empty field never looks filled in.
describe("placeholders and typical ranges per field", () => {
  it.each(PART_KINDS)("%s: every hint belongs to a field of the kind, and every example placeholder reads as that field's quantity", (kind) => {
    const fields = new Map((KIND_DEFINITIONS[kind].fields as readonly FieldDef[]).map((f) => [f.key, f]));
    for (const [key, hint] of Object.entries(FIELD_HINTS[kind])) {
      const field = fields.get(key);
      expect(field, `${kind}.${key}`).toBeDefined();
      if (field?.type !== "quantity" || !/^[-\d.]/.test(hint.placeholder)) continue;
      const parsed = parseQuantity(hint.placeholder, field.quantity);
      expect(parsed.ok, `${kind}.${key}: ${hint.placeholder}`).toBe(true);
    }
  });

  it("an example value is shown as an example; words are shown as they are", () => {
    expect(placeholderText({ placeholder: "100 °C" })).toBe("e.g. 100 °C");
    expect(placeholderText({ placeholder: "-2 mV/K" })).toBe("e.g. -2 mV/K");
    expect(placeholderText({ placeholder: "leave empty: worked out" })).toBe("leave empty: worked out");
    expect(placeholderText(undefined, "20 mm")).toBe("e.g. 20 mm");
  });
});
