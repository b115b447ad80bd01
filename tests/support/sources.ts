// What counts as a source a reader can look up (the trace walker's rule).
const REPOSITORY_OR_DESIGN_DOC = /\b[\w./-]+\.(ts|tsx|js|mjs|md|json|sql)\b|\b(lib|components|server|app|db|scripts|docs|tests)\/|PRODUCT|STYLE\b|DEVELOPERS|design doc/i;
const FINDABLE = [
  /["“][^"”]{6,}["”]/, // a quoted title of a book or paper
  /[A-Z][\w.-]+[^;]*\b(1[89]|20)\d{2}\b/, // authors with a year (a paper)
  /\b(ISO|IEC|EN|ANSI|JEDEC|ASTM|ASHRAE|UL|IEEE|DIN)\s?\d/, // a standard
  /common practice|from memory|as entered/i, // an honest mark
  /any physics textbook/i, // a definition or a basic law (P = V·I, Joule's law)
  /cites its own source|own trace cites its source/i, // a method over the model, whose links cite theirs
];

export function sourceProblem(source: unknown): string | null {
  if (typeof source !== "string" || source.trim().length < 8) return "empty source";
  if (REPOSITORY_OR_DESIGN_DOC.test(source)) return "cites a repository file or design document";
  if (!FINDABLE.some((re) => re.test(source))) return "names no book, paper, standard or honest mark";
  return null;
}
