/** The reserved id of the fixed-temperature node every heat path ends at. */
export const AMBIENT_ID = "ambient";
