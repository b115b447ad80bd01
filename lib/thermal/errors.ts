/**
 * The one error type the engine throws for input it cannot answer. `code` uses the
 * application's `kind:subject` convention so a route maps it to an HTTP status without a
 * table of its own: `bad_request:*` → 400, `unprocessable:*` → 422.
 */
export type ThermalErrorCode = `bad_request:${string}` | `unprocessable:${string}`;

export class ThermalInputError extends Error {
  readonly code: ThermalErrorCode;
  /** The field or node the message is about, e.g. `links[3].to` or `nodes[0].id`. */
  readonly path: string;

  constructor(code: ThermalErrorCode, message: string, path = "") {
    super(message);
    this.name = "ThermalInputError";
    this.code = code;
    this.path = path;
  }
}

export const isThermalInputError = (e: unknown): e is ThermalInputError => e instanceof ThermalInputError;
