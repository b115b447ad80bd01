import type { Derivation } from "./derivation";

/** Our own file format for a worked example: what it shows, with the revision's design. */
export const EXAMPLE_FORMAT = "sinkwise-worked-example" as const;
export const EXAMPLE_FORMAT_VERSION = 1 as const;

export interface ExampleFile {
  format: typeof EXAMPLE_FORMAT;
  version: typeof EXAMPLE_FORMAT_VERSION;
  exportedAt: string;
  title: string;
  narrative: string;
  /** `design` is null in a student's copy while the example's values are still questions. */
  build: { title: string; revision: number; design: unknown };
  scenario: { id: string; name: string } | null;
  tolerancePercent: number;
  /** Keys of the values that are questions; their values are null in the derivation when the exporter may not see them. */
  hidden: string[];
  derivation: Derivation | null;
}

export function exampleFileName(title: string): string {
  const slug = title.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 60) || "example";
  return `${slug}.sinkwise-example.json`;
}
