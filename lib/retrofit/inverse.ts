/** The engine's inverse search answers the Budget's and the quick check's "what it takes" (one implementation, in lib/thermal). */
export { maxCommonScale, pathResistance, requiredLinkResistance, SINK_RANGE_KPERW, type ResistanceAnswer, type ScaleAnswer } from "@/lib/thermal";
