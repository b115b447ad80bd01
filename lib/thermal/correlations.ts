/**
 * The natural-convection correlations, written once. A leaf module (it imports nothing):
 * the element models (which format traces), the solvers' kernel (which evaluates them
 * thousands of times per warm-up) and the finned-heatsink model all call these functions,
 * so a correlation cannot differ between what the solver computes and what a trace shows.
 */

const INCROPERA_CH9 = 'Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", 6th ed., ch. 9';

export const SURFACES = ["vertical-plate", "horizontal-plate-up", "horizontal-plate-down", "horizontal-cylinder"] as const;
export type Surface = (typeof SURFACES)[number];

/** Surfaces as small integers for the loops; a colder horizontal plate flips up ↔ down. */
export const SURFACE_CODE: Readonly<Record<Surface, number>> = {
  "vertical-plate": 0,
  "horizontal-cylinder": 1,
  "horizontal-plate-up": 2,
  "horizontal-plate-down": 3,
};
const SURFACE_OF_CODE: readonly Surface[] = ["vertical-plate", "horizontal-cylinder", "horizontal-plate-up", "horizontal-plate-down"];

/** A horizontal plate colder than the air sheds its boundary layer like a hot plate turned over. */
export const flippedCode = (code: number): number => (code >= 2 ? 5 - code : code);

/** The surface whose correlation applies: the given one, or a horizontal plate turned over when it is colder than the air. */
export function effectiveSurface(surface: Surface, hotter: boolean): Surface {
  return hotter ? surface : SURFACE_OF_CODE[flippedCode(SURFACE_CODE[surface])]!;
}

/**
 * x^(9/16) = ¹⁶√(x⁹) and y^(4/9) = ∛∛(y⁴), y^(8/27) = ∛∛∛(y⁸): the same powers by
 * correctly rounded roots, within an ulp or two of `**` and under half its cost.
 */
function pow9by16(x: number): number {
  const x2 = x * x;
  const x4 = x2 * x2;
  return Math.sqrt(Math.sqrt(Math.sqrt(Math.sqrt(x4 * x4 * x))));
}
function pow4by9(y: number): number {
  const y2 = y * y;
  return Math.cbrt(Math.cbrt(y2 * y2));
}
function pow8by27(y: number): number {
  const y2 = y * y;
  const y4 = y2 * y2;
  return Math.cbrt(Math.cbrt(Math.cbrt(y4 * y4)));
}

/** Vertical plate: the laminar form up to this Rayleigh number, the all-Ra form above. */
export const VERTICAL_LAMINAR_RA = 1e9;
/** Hot plate facing up: laminar (¼ power) up to this Rayleigh number, turbulent (⅓) above. */
export const UP_LAMINAR_RA = 1e7;

/**
 * Nusselt number of the effective surface (by code). With `grad`, also writes ∂Nu/∂ln Ra and
 * ∂Nu/∂Pr: for a Churchill–Chu form with F = [1 + u]^e, u = (c/Pr)^(9/16),
 * d ln F/d Pr = −(9/16)·e·u/((1 + u)·Pr), which is −¼·u/((1 + u)·Pr) for e = 4/9 and
 * −⅙·u/((1 + u)·Pr) for e = 8/27.
 */
export function nusseltOf(effective: number, ra: number, pr: number, grad: Float64Array | null): number {
  if (effective === 0 || effective === 1) {
    const laminar = effective === 0 && ra <= VERTICAL_LAMINAR_RA;
    const u = pow9by16((effective === 0 ? 0.492 : 0.559) / pr);
    if (laminar) {
      const r = (0.67 * Math.sqrt(Math.sqrt(ra))) / pow4by9(1 + u);
      if (grad) {
        grad[0] = 0.25 * r;
        grad[1] = (0.25 * r * u) / ((1 + u) * pr);
      }
      return 0.68 + r;
    }
    const s = (0.387 * Math.sqrt(Math.cbrt(ra))) / pow8by27(1 + u);
    const x = (effective === 0 ? 0.825 : 0.6) + s;
    if (grad) {
      grad[0] = (x * s) / 3;
      grad[1] = (x * s * u) / (3 * (1 + u) * pr);
    }
    return x * x;
  }
  let nu: number;
  let exponent: number;
  if (effective === 2) {
    const laminar = ra <= UP_LAMINAR_RA;
    nu = laminar ? 0.54 * Math.sqrt(Math.sqrt(ra)) : 0.15 * Math.cbrt(ra);
    exponent = laminar ? 0.25 : 1 / 3;
  } else {
    nu = 0.52 * ra ** 0.2;
    exponent = 0.2;
  }
  if (grad) {
    grad[0] = exponent * nu;
    grad[1] = 0;
  }
  return nu;
}

/** Nusselt number of a surface already turned to its effective side (see `effectiveSurface`). */
export const nusseltNumber = (surface: Surface, ra: number, pr: number): number => nusseltOf(SURFACE_CODE[surface], ra, pr, null);

export interface CorrelationDescription {
  correlation: string;
  equation: string;
  source: string;
  range: string;
  inRange: boolean;
  /** How h grows with ΔT in this branch: Nu ∝ Ra^n (n = ¼ laminar, ⅓ turbulent, ⅕ plate facing down). */
  exponent: number;
}

/** What a trace says about the correlation applied to an effective surface at Ra and Pr: the same branches as `nusseltOf`. */
export function describeCorrelation(surface: Surface, ra: number, pr: number): CorrelationDescription {
  switch (surface) {
    case "vertical-plate":
      if (ra <= VERTICAL_LAMINAR_RA) {
        return {
          correlation: "Churchill–Chu, vertical plate, laminar form",
          equation: "Nu_L = 0.68 + 0.670·Ra_L^(1/4) / [1 + (0.492/Pr)^(9/16)]^(4/9)",
          source: `Churchill & Chu, Int. J. Heat Mass Transfer 18 (1975) 1323; as ${INCROPERA_CH9}, eq. 9.27`,
          range: "Ra_L ≤ 10⁹ (laminar)",
          inRange: true,
          exponent: 0.25,
        };
      }
      return {
        correlation: "Churchill–Chu, vertical plate, all Rayleigh numbers",
        equation: "Nu_L = {0.825 + 0.387·Ra_L^(1/6) / [1 + (0.492/Pr)^(9/16)]^(8/27)}²",
        source: `Churchill & Chu, Int. J. Heat Mass Transfer 18 (1975) 1323; as ${INCROPERA_CH9}, eq. 9.26`,
        range: "10⁻¹ ≤ Ra_L ≤ 10¹²",
        inRange: ra <= 1e12,
        exponent: 1 / 3,
      };
    case "horizontal-cylinder":
      return {
        correlation: "Churchill–Chu, long horizontal cylinder",
        equation: "Nu_D = {0.60 + 0.387·Ra_D^(1/6) / [1 + (0.559/Pr)^(9/16)]^(8/27)}²",
        source: `Churchill & Chu, Int. J. Heat Mass Transfer 18 (1975) 1049; as ${INCROPERA_CH9}, eq. 9.34`,
        range: "Ra_D ≤ 10¹² (characteristic length = diameter)",
        inRange: ra <= 1e12,
        exponent: 0.25,
      };
    case "horizontal-plate-up":
      if (ra <= UP_LAMINAR_RA) {
        return {
          correlation: "Upper surface of a hot plate (or lower surface of a cold plate), laminar",
          equation: "Nu_L = 0.54·Ra_L^(1/4), L = A/P",
          source: `Goldstein, Sparrow & Jones (1973), Lloyd & Moran (1974); as ${INCROPERA_CH9}, eq. 9.30`,
          range: "10⁴ ≤ Ra_L ≤ 10⁷, Pr ≥ 0.7",
          inRange: ra >= 1e4 && pr >= 0.7,
          exponent: 0.25,
        };
      }
      return {
        correlation: "Upper surface of a hot plate (or lower surface of a cold plate), turbulent",
        equation: "Nu_L = 0.15·Ra_L^(1/3), L = A/P",
        source: `Lloyd & Moran (1974); as ${INCROPERA_CH9}, eq. 9.31`,
        range: "10⁷ ≤ Ra_L ≤ 10¹¹, all Pr",
        inRange: ra <= 1e11,
        exponent: 1 / 3,
      };
    case "horizontal-plate-down":
      return {
        correlation: "Lower surface of a hot plate (or upper surface of a cold plate)",
        equation: "Nu_L = 0.52·Ra_L^(1/5), L = A/P",
        source: `Radziemska & Lewandowski (2001); as Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", 7th ed., eq. 9.32`,
        range: "10⁴ ≤ Ra_L ≤ 10⁹, Pr ≥ 0.7",
        inRange: ra >= 1e4 && ra <= 1e9 && pr >= 0.7,
        exponent: 0.2,
      };
  }
}

/** The laminar exponent of h on ΔT (Nu ∝ Ra^¼ ⇒ h ∝ ΔT^¼): what a declared natural-convection rating is corrected with. */
export const LAMINAR_EXPONENT = 0.25;

/**
 * Vertical parallel-plate channels, isothermal symmetric walls (the channels of a
 * straight-fin heatsink): Bar-Cohen & Rohsenow's composite of the fully developed limit
 * Nu = El/24 and the isolated-plate limit Nu ∝ El^¼, with El = gβΔT·s⁴/(να·L).
 */
export function channelNusselt(elenbaas: number): number {
  return (576 / (elenbaas * elenbaas) + 2.87 / Math.sqrt(elenbaas)) ** -0.5;
}

export const CHANNEL_SOURCE =
  'Bar-Cohen & Rohsenow, J. Heat Transfer 106 (1984) 116, symmetric isothermal plates; as Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", 6th ed., §9.7 (equation and table numbers from memory — check against a copy)';

/** Bar-Cohen & Rohsenow's optimum spacing of symmetric isothermal plates, s_opt = 2.714·(gβΔT/(να·L))^(−¼) (the closed form the channel correlation's maximum should match). */
export const OPTIMUM_SPACING_COEFFICIENT = 2.714;

/** How the fins of a straight-fin sink stand in use. */
export const FIN_DIRECTIONS = ["vertical", "horizontal", "up", "down"] as const;
export type FinDirection = (typeof FIN_DIRECTIONS)[number];

/** What each fin direction's model rests on, for the trace. */
export const FIN_DIRECTION_SOURCE: Readonly<Record<FinDirection, string>> = {
  vertical: `channels: ${CHANNEL_SOURCE}; outer faces: Churchill & Chu, as ${INCROPERA_CH9}, eq. 9.27`,
  up:
    `fins pointing up from a level base: the vertical-channel correlation with the fin height as the channel's rise (${CHANNEL_SOURCE}) — applying it this way is common practice, not a published fit for upward arrays; ` +
    `outer faces: Churchill & Chu, as ${INCROPERA_CH9}, eq. 9.27 with L = fin height`,
  horizontal:
    `level fins on an upright base: the fins between the end fins as a block with vertical front and gap ends (Churchill & Chu, as ${INCROPERA_CH9}, eq. 9.27, L = base width) — a conservative bound (common practice); ` +
    `end fins' free faces: upper face of a hot plate, ${INCROPERA_CH9}, eq. 9.30/9.31, lower face 7th ed. eq. 9.32, L = A/P, no better than eq. 9.27 stood vertical`,
  down:
    `fins hanging down from a level base: the array taken as a block shedding heat from its underside (lower surface of a hot plate, Incropera, DeWitt, Bergman & Lavine, 7th ed., eq. 9.32, L = A/P) and from its open ends and end fins (Churchill & Chu, as ${INCROPERA_CH9}, eq. 9.27, L = fin height) — a conservative bound (common practice); ` +
    `measured downward arrays: Dayan, Kushnir, Mittelman & Ullmann, Int. J. Heat Mass Transfer (2004), issue 12–13, pp. 2849–2860`,
};
