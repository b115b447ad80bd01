/** One colour per series, shared by charts and the labels beside them (no chart library needed to read it). */
export const SERIES_COLOURS = ["#c2410c", "#2563eb", "#0e7490", "#7c3aed", "#b7791f", "#2f7d4f", "#be185d", "#475569"];
