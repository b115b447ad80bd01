import { cellNotes } from "./kinds/cell";
import { chargerNotes } from "./kinds/charger";
import { driverNotes } from "./kinds/driver";
import { emitterNotes } from "./kinds/emitter";
import { heatsinkNotes } from "./kinds/heatsink";
import { housingNotes } from "./kinds/housing";
import { interfaceNotes } from "./kinds/interface";
import { protectionNotes } from "./kinds/protection";
import { spreaderNotes } from "./kinds/spreader";
import type { PartNote } from "./notes";
import type { Part } from "./schema";

/** Advisory notes on a validated part (never errors: the part is saved as entered). */
export function partNotes(part: Part): PartNote[] {
  switch (part.kind) {
    case "emitter":
      return emitterNotes(part.specs);
    case "driver":
      return driverNotes(part.specs);
    case "heatsink":
      return heatsinkNotes(part.specs);
    case "interface":
      return interfaceNotes(part.specs);
    case "spreader":
      return spreaderNotes(part.specs);
    case "housing":
      return housingNotes(part.specs);
    case "cell":
      return cellNotes(part.specs);
    case "charger":
      return chargerNotes(part.specs);
    case "protection":
      return protectionNotes(part.specs);
  }
}
