import type { ContactClass } from "./design-schema";
import { q, SOURCES, trace, type Traced } from "./trace";

/**
 * Contact burn thresholds for bare (uncoated) metal by contact time, from ISO 13732-1:2006
 * (figures for uncoated metals and the table for contact of 1 min and longer). Values are
 * from memory of the standard and are the lower edge of its threshold bands: check them
 * against a copy before leaning on them. Coated metals, plastics and wood tolerate more
 * for short contact; metal is taken for every housing (conservative).
 */
export const TOUCH_THRESHOLDS_C: Readonly<Record<ContactClass, { limitC: number; contact: string }>> = {
  "touch-1s": { limitC: 65, contact: "an accidental touch, about 1 s" },
  "grip-10s": { limitC: 55, contact: "picked up briefly, about 10 s" },
  "hold-1min": { limitC: 51, contact: "held for about a minute" },
  "hold-10min": { limitC: 48, contact: "held for about 10 minutes" },
  "hold-8h": { limitC: 43, contact: "held for hours" },
};

export function touchLimit(contact: ContactClass): Traced {
  const t = TOUCH_THRESHOLDS_C[contact];
  return {
    value: t.limitC,
    unit: "°C",
    trace: trace({
      element: "touch-limit",
      formula: "Contact burn threshold for the way the light is held",
      equation: "T_limit = burn threshold(material, contact time)",
      inputs: [q("t_contact", t.contact, contact === "touch-1s" ? 1 : contact === "grip-10s" ? 10 : contact === "hold-1min" ? 60 : contact === "hold-10min" ? 600 : 28800, "s")],
      result: q("T_limit", "burn threshold, uncoated metal", t.limitC, "°C"),
      source: SOURCES.iso13732,
      notes: ["Values from memory of ISO 13732-1 (lower edge of the burn-threshold band for bare metal).", "A threshold for burns, not for comfort: a housing this hot is unpleasant long before."],
    }),
  };
}
