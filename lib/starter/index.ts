export { STARTER_PARTS, STARTER_NOTE, starterPart, starterSlot } from "./catalogue";
export type { StarterPart } from "./catalogue";
export { STARTING_POINTS, STARTING_POINT_INFO, startingDesign } from "./starting-points";
export type { StartingPoint } from "./starting-points";
