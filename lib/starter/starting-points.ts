import { starterSlot } from "./catalogue";

/**
 * New builds from a starting point: a kind of light with every slot filled from the
 * starter bin, so the first Budget is one click away and the maker changes what differs.
 */
export const STARTING_POINTS = ["torch", "lantern", "headlamp", "inspection-lamp"] as const;
export type StartingPoint = (typeof STARTING_POINTS)[number];

export const STARTING_POINT_INFO: Record<StartingPoint, { label: string; title: string; description: string }> = {
  torch: { label: "Torch", title: "My torch", description: "Aluminium torch body, a 3 W emitter on a small chipset sink pressed to the body, a 3-mode buck driver (700 mA on high), one 18650 cell and a half-amp USB charger board." },
  lantern: { label: "Lantern", title: "My lantern", description: "Square steel lantern, a 3 W emitter on a mid-size finned sink in the housing air, a 3-mode buck driver, two 18650 cells in parallel and a half-amp USB charger board." },
  headlamp: { label: "Headlamp", title: "My headlamp", description: "Brass lamp body, a 1 W emitter pressed to the shell, a linear driver (350 mA on high) strapped with copper tape, one 18650 cell and a half-amp USB charger board." },
  "inspection-lamp": { label: "Inspection lamp", title: "My inspection lamp", description: "Aluminium body, a 10 W emitter on a mid-size finned sink pressed to the body, a buck driver (2.8 A on high) on the wall, one 21700 cell and a one-amp USB charger board: a build that needs its heat path worked on." },
};

const common = { environment: { ambientC: 25, orientation: "upright", air: { kind: "still" }, contact: "hold-1min" } } as const;

/** The design as JSON a person could have typed; the builds API (buildDesignSchema) reads it. */
export function startingDesign(point: StartingPoint): Record<string, unknown> {
  switch (point) {
    case "torch":
      return {
        housing: starterSlot("housing-aluminium-torch"),
        housingShape: { form: "tube", characteristicLengthM: "25 mm" },
        lightEngine: { emitter: starterSlot("emitter-3w"), count: 1, interface: starterSlot("paste"), heatsink: starterSlot("sink-chipset"), mount: { kind: "pressed-to-wall", interface: starterSlot("paste"), contactAreaM2: "4 cm²" } },
        driver: { part: starterSlot("driver-buck-3mode-low"), cooling: { kind: "ground-plane-to-wall", interface: starterSlot("pad") } },
        pack: { cell: starterSlot("cell-18650-3000"), series: 1, parallel: 1, protection: starterSlot("protection-1cell"), charger: starterSlot("charger-usb-05a") },
        ...common,
        costs: { extras: [], comparableNewLightEur: 25 },
      };
    case "lantern":
      return {
        housing: starterSlot("housing-steel-lantern"),
        housingShape: { form: "box" },
        lightEngine: { emitter: starterSlot("emitter-3w"), count: 1, interface: starterSlot("paste"), heatsink: starterSlot("sink-finned-mid"), mount: { kind: "in-housing-air" } },
        driver: { part: starterSlot("driver-buck-3mode-low"), cooling: { kind: "floating" } },
        pack: { cell: starterSlot("cell-18650-2600"), series: 1, parallel: 2, protection: starterSlot("protection-1cell-high"), charger: starterSlot("charger-usb-05a") },
        ...common,
        costs: { extras: [], comparableNewLightEur: 40 },
      };
    case "headlamp":
      return {
        housing: starterSlot("housing-brass-lamp"),
        housingShape: { form: "tube", characteristicLengthM: "70 mm" },
        lightEngine: { emitter: starterSlot("emitter-1w"), count: 1, interface: starterSlot("paste"), heatsink: starterSlot("sink-chipset"), mount: { kind: "pressed-to-wall", interface: starterSlot("paste") } },
        driver: { part: starterSlot("driver-linear-3mode-low"), cooling: { kind: "strapped", spreader: starterSlot("copper-tape"), adhesive: starterSlot("adhesive") } },
        pack: { cell: starterSlot("cell-18650-2600"), series: 1, parallel: 1, protection: starterSlot("protection-1cell"), charger: starterSlot("charger-usb-05a") },
        ...common,
        environment: { ...common.environment, contact: "hold-8h" },
        costs: { extras: [], comparableNewLightEur: 30 },
      };
    case "inspection-lamp":
      return {
        housing: starterSlot("housing-aluminium-torch"),
        housingShape: { form: "tube", characteristicLengthM: "40 mm" },
        lightEngine: { emitter: starterSlot("emitter-10w"), count: 1, interface: starterSlot("paste"), heatsink: starterSlot("sink-finned-mid"), mount: { kind: "pressed-to-wall", interface: starterSlot("pad") } },
        driver: { part: starterSlot("driver-buck-3mode"), cooling: { kind: "ground-plane-to-wall", interface: starterSlot("pad") } },
        pack: { cell: starterSlot("cell-21700-5000"), series: 1, parallel: 1, protection: starterSlot("protection-1cell-high"), charger: starterSlot("charger-usb-1a") },
        ...common,
        environment: { ...common.environment, contact: "grip-10s" },
        costs: { extras: [], comparableNewLightEur: 35 },
      };
  }
}
