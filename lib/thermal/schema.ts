import { z } from "zod";
import { NETWORK_LIMITS } from "./constants";
import { FIN_DIRECTIONS, SURFACES } from "./correlations";
import { referenceIssues, transientIssues } from "./validate";

/**
 * Network JSON, version 1 — the single definition of the engine's input. Types are
 * inferred from these schemas; nothing here is written twice. Bounds on numbers are the
 * physically plausible range, wide enough for any lamp and narrow enough that no sum in
 * the solver can overflow to Infinity.
 */

const finite = (min: number, max: number) => z.number().min(min).max(max);
const positive = (max: number, min = 1e-12) => z.number().min(min, `must be ≥ ${min} (positive)`).max(max);

const nodeId = z
  .string()
  .min(1, "node id must not be empty")
  .max(100, "node id is longer than 100 characters");

export const nodeSchema = z.object({
  id: nodeId,
  label: z.string().max(200).optional(),
  heatCapacityJPerK: positive(1e12, 1e-9).optional(),
});

const linkBase = {
  from: nodeId,
  to: nodeId,
  label: z.string().max(200).optional(),
};

export const surfaceSchema = z.enum(SURFACES);

const emissivity = z.number().gt(0, "emissivity must be in (0, 1]").max(1, "emissivity must be in (0, 1]");
const length = positive(1e3, 1e-9);
const area = positive(1e4, 1e-12);
const conductivity = positive(1e5, 1e-6);

export const resistanceLinkSchema = z.object({ ...linkBase, type: z.literal("resistance"), kelvinPerWatt: positive(1e9, 1e-9) });
export const conductionLinkSchema = z.object({
  ...linkBase,
  type: z.literal("conduction"),
  lengthM: length,
  areaM2: area,
  conductivityWPerMK: conductivity,
});
export const convectionLinkSchema = z.object({
  ...linkBase,
  type: z.literal("convection"),
  areaM2: area,
  coefficientWPerM2K: positive(1e6, 1e-9),
});
export const naturalConvectionLinkSchema = z.object({
  ...linkBase,
  type: z.literal("natural-convection"),
  areaM2: area,
  surface: surfaceSchema,
  characteristicLengthM: length,
});
export const radiationLinkSchema = z.object({ ...linkBase, type: z.literal("radiation"), areaM2: area, emissivity });

/** Extension to v1: a straight-fin heatsink from its geometry, evaluated at the solution temperatures. */
export const finnedHeatsinkLinkSchema = z.object({
  ...linkBase,
  type: z.literal("finned-heatsink"),
  /** Across the fins. */
  baseWidthM: length,
  /** Along the fins — the height of the channels when the fins are vertical. */
  baseLengthM: length,
  baseThicknessM: length,
  finCount: z.number().int().min(2).max(500),
  finHeightM: length,
  finThicknessM: length,
  conductivityWPerMK: conductivity,
  /** 0: the envelope's radiation is left to a radiation link of its own (to what the sink sees). */
  emissivity: z.number().min(0, "emissivity must be in [0, 1]").max(1, "emissivity must be in [0, 1]"),
  /** Air speed through the channels from a fan, m/s; absent or 0 means still air. */
  airSpeedMPerS: finite(0, 100).optional(),
  /** Whether the back of the base also faces the air (default false: it is mounted). */
  backExposed: z.boolean().optional(),
  /** How the fins stand: vertical (default), horizontal (level fins on an upright base), up or down (level base, fins pointing up or hanging down). */
  finDirection: z.enum(FIN_DIRECTIONS, { error: `must be one of: ${FIN_DIRECTIONS.join(", ")}` }).optional(),
});

export const linkSchema = z.discriminatedUnion("type", [
  resistanceLinkSchema,
  conductionLinkSchema,
  convectionLinkSchema,
  naturalConvectionLinkSchema,
  radiationLinkSchema,
  finnedHeatsinkLinkSchema,
]);

export const sourceSchema = z.object({
  node: nodeId,
  watts: finite(-1e7, 1e7),
  /** Extension: heat that grows with the node's temperature, W/K (e.g. a linear regulator's share). */
  wattsPerKelvin: finite(-1e6, 1e6).optional(),
  /** Temperature at which `watts` holds; defaults to the ambient temperature. */
  referenceC: finite(-150, 1000).optional(),
});

const networkShape = z.object({
  ambientC: finite(-150, 1000),
  nodes: z.array(nodeSchema).min(1, "a network needs at least one node").max(NETWORK_LIMITS.maxNodes, `at most ${NETWORK_LIMITS.maxNodes} nodes`),
  links: z.array(linkSchema).min(1, "a network needs at least one link").max(NETWORK_LIMITS.maxLinks, `at most ${NETWORK_LIMITS.maxLinks} links`),
  sources: z.array(sourceSchema).max(NETWORK_LIMITS.maxSources, `at most ${NETWORK_LIMITS.maxSources} sources`).default([]),
});

export const networkSchema = networkShape.superRefine((network, ctx) => {
  for (const issue of referenceIssues(network)) ctx.addIssue({ code: "custom", message: issue.message, path: issue.path });
});

export const thresholdSchema = z.object({ node: nodeId, limitC: finite(-150, 1000) });

export const transientRequestSchema = z
  .object({
    network: networkSchema,
    durationS: positive(1e8, 1e-9),
    stepS: positive(1e8, 1e-9),
    initialC: z.union([finite(-150, 1000), z.record(nodeId, finite(-150, 1000))]).optional(),
    thresholds: z.array(thresholdSchema).max(NETWORK_LIMITS.maxThresholds).optional(),
  })
  .superRefine((req, ctx) => {
    const limits = { maxSteps: NETWORK_LIMITS.maxTransientSteps, maxValues: NETWORK_LIMITS.maxTransientValues };
    for (const issue of transientIssues(req, limits)) ctx.addIssue({ code: "custom", message: issue.message, path: issue.path });
  });

export type Network = z.infer<typeof networkSchema>;
/** What a caller may pass before defaults are filled (sources may be omitted). */
export type NetworkInput = z.input<typeof networkSchema>;
export type NetworkNode = z.infer<typeof nodeSchema>;
export type NetworkLink = z.infer<typeof linkSchema>;
export type LinkType = NetworkLink["type"];
export type HeatSource = z.infer<typeof sourceSchema>;
export type Surface = z.infer<typeof surfaceSchema>;
export type FinnedHeatsinkLink = z.infer<typeof finnedHeatsinkLinkSchema>;
export type Threshold = z.infer<typeof thresholdSchema>;
export type TransientRequest = z.infer<typeof transientRequestSchema>;
export type TransientOptions = Omit<TransientRequest, "network">;
