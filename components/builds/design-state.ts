/** Loose JSON the editor edits; the API's schema is the judge of what is valid. */
export type Json = null | boolean | number | string | Json[] | { [key: string]: Json };
export type JsonObject = { [key: string]: Json };

export function getPath(obj: Json | undefined, path: string): Json | undefined {
  let cur: Json | undefined = obj;
  for (const key of path.split(".")) {
    if (cur === null || cur === undefined || typeof cur !== "object" || Array.isArray(cur)) return undefined;
    cur = cur[key];
  }
  return cur;
}

/** A copy of `obj` with `path` set (or removed, when value is undefined). */
export function setPath(obj: JsonObject, path: string, value: Json | undefined): JsonObject {
  const [head, ...rest] = path.split(".");
  if (head === undefined) return obj;
  const copy: JsonObject = { ...obj };
  if (rest.length === 0) {
    if (value === undefined) delete copy[head];
    else copy[head] = value;
    return copy;
  }
  const child = copy[head];
  const base: JsonObject = child && typeof child === "object" && !Array.isArray(child) ? child : {};
  copy[head] = setPath(base, rest.join("."), value);
  return copy;
}
