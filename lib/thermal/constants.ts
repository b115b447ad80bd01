/** Physical constants used by the engine, each with where it comes from. */

/** Stefan–Boltzmann constant, W/(m²·K⁴). Exact in SI since the 2019 redefinition (CODATA 2018). */
export const STEFAN_BOLTZMANN = 5.670374419e-8;

/** Standard acceleration of gravity, m/s² (3rd CGPM, 1901; exact by definition). */
export const STANDARD_GRAVITY = 9.80665;

/** Offset between °C and K (exact by definition of the Celsius scale). */
export const ZERO_CELSIUS_K = 273.15;

export const toKelvin = (celsius: number): number => celsius + ZERO_CELSIUS_K;
export const toCelsius = (kelvin: number): number => kelvin - ZERO_CELSIUS_K;

/** Hard limits of a network, shared by the schema and the docs. */
export const NETWORK_LIMITS = {
  maxNodes: 500,
  maxLinks: 2000,
  maxSources: 2000,
  maxThresholds: 500,
  /** Points kept by a transient answer (times × nodes), so a reply stays a few MB at most. */
  maxTransientValues: 2_000_000,
  maxTransientSteps: 200_000,
} as const;
