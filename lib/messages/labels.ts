import { CURVE_KIND_INFO, type CurveKind } from "@/lib/curves/kinds";
import { COMMON_FIELDS, KIND_DEFINITIONS, PART_KINDS, type PartKind } from "@/lib/parts";
import { DESIGN_LABELS, DESIGN_SLOTS, type DesignField } from "@/lib/retrofit/design-labels";
import { QUICK_CHECK_LABELS } from "@/lib/retrofit/quick-check-labels";
import { humanize, labelFor, type LabelResolver, type PathKey } from "./plain-issues";

/**
 * Labels on screen for every kind of body the app takes, by path. Each form shows the
 * same labels (the field tables of lib/parts, DESIGN_LABELS, QUICK_CHECK_LABELS), so a
 * message names what the person sees.
 */

const MODE_LABELS: Record<string, string> = { name: "Name", outputCurrentA: "Output current", outputPowerW: "Output power", efficiency: "Efficiency" };
const COMMON_LABELS: Record<string, string> = Object.fromEntries(COMMON_FIELDS.map((f) => [f.key, f.label]));
const GENERAL_LABELS: Record<string, string> = {
  title: "Title",
  summary: "Summary",
  visibility: "Visibility",
  note: "What changed",
  email: "E-mail",
  password: "Password",
  displayName: "Name",
  body: "Comment",
  verdict: "Verdict",
  revision: "Revision",
  variantNote: "What the variant changes",
  ...COMMON_LABELS,
};

const isKind = (k: unknown): k is PartKind => typeof k === "string" && (PART_KINDS as readonly string[]).includes(k);

function specLabel(key: PathKey | undefined, kind?: PartKind): string | null {
  if (typeof key !== "string") return null;
  const kinds = kind ? [kind, ...PART_KINDS] : PART_KINDS;
  for (const k of kinds) {
    const f = KIND_DEFINITIONS[k].fields.find((d) => d.key === key);
    if (f) return f.label;
  }
  return null;
}

/** Labels inside one part's specs/curves (relative path), e.g. ["modes", 1, "efficiency"] → "Modes, row 2 › Efficiency". */
export function partSpecsLabel(path: readonly PathKey[], kind?: PartKind): string | null {
  const [key, index, sub] = path;
  const label = specLabel(key, kind);
  if (!label) return null;
  if (typeof index === "number") {
    const row = `${label}, row ${index + 1}`;
    return typeof sub === "string" ? `${row} › ${MODE_LABELS[sub] ?? humanize(sub)}` : row;
  }
  return label;
}

function curveLabel(path: readonly PathKey[]): string | null {
  const [kind, points, index, axis] = path;
  const info = typeof kind === "string" ? CURVE_KIND_INFO[kind as CurveKind] : undefined;
  if (!info) return null;
  if (points !== "points") return info.label;
  if (typeof index !== "number") return `${info.label}, points`;
  const ax = axis === "x" ? info.x.label : axis === "y" ? info.y.label : null;
  return `${info.label}, point ${index + 1}${ax ? ` › ${ax}` : ""}`;
}

/** A part body: { name, kind, specs: {...}, curves: {...} }. */
export const partLabels =
  (kind?: PartKind): LabelResolver =>
  (path) => {
    const [head, ...rest] = path;
    if (head === "specs") return rest.length === 0 ? "Specifications" : partSpecsLabel(rest, kind);
    if (head === "curves") return rest.length === 0 ? "Curves" : curveLabel(rest);
    if (typeof head === "string" && path.length === 1) return GENERAL_LABELS[head] ?? (head === "kind" ? "Kind" : null);
    return null;
  };

/** A build design (path relative to the design): the editor's labels, slots typed in named "Heatsink › Fin count". */
export const designLabels: LabelResolver = (path) => {
  for (let n = path.length; n > 0; n--) {
    const key = path.slice(0, n).join(".");
    if (!(key in DESIGN_LABELS)) continue;
    const label = DESIGN_LABELS[key as DesignField];
    const rest = path.slice(n);
    if (rest.length === 0) return label;
    const kind = (DESIGN_SLOTS as Record<string, PartKind>)[key];
    if (kind && rest[0] === "inline") return rest.length === 1 ? `${label} (typed in)` : `${label} › ${partSpecsLabel(rest.slice(1), kind) ?? labelFor(rest.slice(1))}`;
    if (kind && rest[0] === "curves") return `${label} › ${curveLabel(rest.slice(1)) ?? "curves"}`;
    if (kind && rest[0] === "partId") return label;
    if (kind && rest[0] === "name") return `${label} › Name`;
    if (kind && rest[0] === "costEur") return `${label} › Cost (EUR)`;
    // An evaluation names a part's figure by its key ("driver.part.maxBoardTempC").
    const spec = kind ? partSpecsLabel(rest, kind) : null;
    if (spec) return `${label} › ${spec}`;
    return `${label} › ${labelFor(rest)}`;
  }
  return null;
};

/** "driver.modes[2]" → ["driver", "modes", 2]. */
export function pathKeys(field: string): (string | number)[] {
  return field.split(/\.|\[|\]/).filter((k) => k !== "").map((k) => (/^\d+$/.test(k) ? Number(k) : k));
}

/** The on-screen name of what an evaluation problem is about ("Driver › Max board temperature"), never its machine path. */
export function problemLabel(field: string): string {
  return designLabels(pathKeys(field)) ?? "The build as a whole";
}

/** Bodies that carry a design ({ title, design }) or a build file ({ build: { design } }). */
const buildLabels: LabelResolver = (path) => {
  const at = path.indexOf("design");
  if (at >= 0) return path.length === at + 1 ? "Design" : designLabels(path.slice(at + 1));
  return path.length === 1 && typeof path[0] === "string" ? (GENERAL_LABELS[path[0]] ?? null) : null;
};

const quickCheckLabels: LabelResolver = (path) => {
  const key = path.join(".");
  if (key in QUICK_CHECK_LABELS) return QUICK_CHECK_LABELS[key as keyof typeof QUICK_CHECK_LABELS];
  if (path[0] === "sink" && path[1] === "geometry") return QUICK_CHECK_LABELS[`sink.geometry.${String(path[2])}` as keyof typeof QUICK_CHECK_LABELS] ?? partSpecsLabel(path.slice(2), "heatsink");
  if (path[0] === "interface" && path[1] === "specs") return partSpecsLabel(path.slice(2), "interface");
  return null;
};

const generalLabels: LabelResolver = (path) => (path.length === 1 && typeof path[0] === "string" ? (GENERAL_LABELS[path[0]] ?? null) : null);

/** The labels of the body a route reads, by the route's subject ("build", "part", "check", …). */
export function labelsForSubject(subject: string, body?: unknown): LabelResolver {
  switch (subject) {
    case "build":
    case "build_file":
    case "preview":
      return buildLabels;
    case "part": {
      const kind = body && typeof body === "object" && "kind" in body ? (body as { kind: unknown }).kind : undefined;
      return partLabels(isKind(kind) ? kind : undefined);
    }
    case "check":
      return quickCheckLabels;
    default:
      return generalLabels;
  }
}
