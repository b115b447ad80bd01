export { CURVE_KINDS, CURVE_KIND_INFO } from "./kinds";
export type { CurveKind, CurveKindInfo, CurveAxis } from "./kinds";
export { curveSchema, curvesSchema, MAX_CURVE_POINTS } from "./schema";
export type { Curve, CurveInput, CurvePoint } from "./schema";
export { interpolate, curveRange } from "./interpolate";
export type { Interpolated } from "./interpolate";
export { parseCurveCsv, curveToCsv, headerUnit } from "./csv";
export type { CsvLineError, CurveCsvResult } from "./csv";
