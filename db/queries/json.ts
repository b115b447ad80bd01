import "server-only";

/**
 * A JSON column's value: MariaDB keeps JSON as LONGTEXT, so the driver hands over text, except
 * where MariaDB marks a computed column as JSON and the driver has parsed it already.
 */
export function parseJson(value: unknown): unknown {
  return typeof value === "string" ? JSON.parse(value) : value;
}
