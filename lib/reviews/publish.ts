import { isTrace } from "@/lib/thermal/trace";

/**
 * What a share link may show of an evaluation: the build's figures, and of its parts only
 * what is published (public parts). A part that is private, or someone else's shared part,
 * is never named through a link, and the workings that quote it (a trace's inputs, notes,
 * equation and sub-traces) are left out; the figure the trace arrives at stays.
 */
export interface UnpublishedPart {
  readonly id: string;
  readonly name: string;
}

export const UNPUBLISHED_PART = "a part that is not published";

/** Kept from a trace that quotes an unpublished part: its figure and an honest mark. */
const WITHHELD = {
  formula: "Worked out from a part that is not published",
  equation: "",
  source: "as entered by the build's owner (the part is not published with this link)",
} as const;

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Returns a copy of `value` (any JSON) with every mention of an unpublished part withheld. */
export function withholdUnpublished<T>(value: T, hidden: readonly UnpublishedPart[]): T {
  const needles = hidden.flatMap((p) => [p.name, p.id]).filter((n) => n.trim().length > 0).sort((a, b) => b.length - a.length);
  if (needles.length === 0) return value;
  const mentions = (text: string) => needles.some((n) => text.includes(n));
  const scrub = (text: string) => needles.reduce((out, n) => out.split(n).join(UNPUBLISHED_PART), text);

  const walk = (node: Json): Json => {
    if (typeof node === "string") return mentions(node) ? scrub(node) : node;
    if (Array.isArray(node)) return node.map(walk);
    if (node === null || typeof node !== "object") return node;
    if (isTrace(node) && mentions(JSON.stringify(node))) {
      return { ...(walk({ element: node.element, result: node.result as unknown as Json }) as { [key: string]: Json }), ...WITHHELD, inputs: [], intermediates: [], notes: [], parts: [] };
    }
    return Object.fromEntries(Object.entries(node).map(([k, v]) => [k, walk(v)]));
  };
  return walk(JSON.parse(JSON.stringify(value)) as Json) as T;
}
