import katex from "katex";

/** A trace's equation typeset with KaTeX (the TeX is generated from the engine's own text, not typed by a person). */
export function Tex({ tex, fallback }: { tex: string; fallback: string }) {
  let html: string | null = null;
  try {
    html = katex.renderToString(tex, { throwOnError: true, strict: false, output: "html" });
  } catch {
    html = null;
  }
  if (html === null) return <code className="font-mono text-xs">{fallback}</code>;
  return <span className="tex" title={fallback} dangerouslySetInnerHTML={{ __html: html }} />;
}
