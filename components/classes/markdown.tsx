import "katex/dist/katex.min.css";
import ReactMarkdown from "react-markdown";
import rehypeKatex from "rehype-katex";
import rehypeSanitize, { defaultSchema } from "rehype-sanitize";
import remarkMath from "remark-math";

/**
 * The sanitiser's default (GitHub's) list, plus the class names remark-math gives maths so
 * KaTeX can find it after sanitising. Raw HTML in the text is not rendered at all, and
 * react-markdown drops `javascript:` and other unsafe link targets.
 */
const schema = {
  ...defaultSchema,
  attributes: {
    ...defaultSchema.attributes,
    code: [...(defaultSchema.attributes?.code ?? []), ["className", /^language-./, "math-inline", "math-display"]],
  },
};

/** A narrative or instructions in Markdown with $maths$ (KaTeX, fonts shipped with the app). */
export function Markdown({ text }: { text: string }) {
  return (
    <div className="markdown space-y-2 text-sm leading-relaxed">
      <ReactMarkdown remarkPlugins={[remarkMath]} rehypePlugins={[[rehypeSanitize, schema], [rehypeKatex, { throwOnError: false, strict: false }]]}>
        {text}
      </ReactMarkdown>
    </div>
  );
}
