/**
 * What the solvers need from a link: the heat q it carries from its `from` node (at ti,
 * kelvin) to its `to` node (at tj) and, when asked, ∂q/∂ti and ∂q/∂tj. Written into a
 * caller-owned array so the inner loops allocate nothing.
 */
export interface LinkModel {
  readonly linear: boolean;
  /** Which assembly loop takes the link (solver/assemble.ts): a field, so sorting needs no `instanceof`. */
  readonly kind: LinkKind;
  evaluate(ti: number, tj: number, out: Float64Array, derivatives: boolean): void;
}

export type LinkKind = "linear" | "radiation" | "natural-convection" | "correlation";
