/**
 * Turns an engine trace's equation (plain text with Unicode, e.g. "R = BLT / (k·A)") into
 * TeX for KaTeX. Best effort: what it does not know becomes \text{…}, so the typeset form
 * always reads; the plain equation stays beside it in the trace.
 */
const GREEK: Record<string, string> = {
  α: "\\alpha", β: "\\beta", γ: "\\gamma", δ: "\\delta", Δ: "\\Delta", ε: "\\varepsilon", η: "\\eta", θ: "\\theta",
  λ: "\\lambda", μ: "\\mu", ν: "\\nu", π: "\\pi", ρ: "\\rho", σ: "\\sigma", τ: "\\tau", φ: "\\varphi", Φ: "\\Phi", ψ: "\\psi", ω: "\\omega",
};
const SYMBOLS: Record<string, string> = {
  "·": "\\cdot ", "×": "\\times ", "−": "-", "≤": "\\le ", "≥": "\\ge ", "≈": "\\approx ", "∞": "\\infty ", "√": "\\sqrt ", "″": "''", "°": "^{\\circ}",
  "{": "\\{", "}": "\\}", "%": "\\%", "#": "\\#", "&": "\\&", "$": "\\$", "~": "\\sim ", "\\": "\\backslash ", "^": "^", ";": ";\\quad ",
};
const SUPERSCRIPTS: Record<string, string> = { "⁰": "0", "¹": "1", "²": "2", "³": "3", "⁴": "4", "⁵": "5", "⁶": "6", "⁷": "7", "⁸": "8", "⁹": "9" };
const SUBSCRIPTS: Record<string, string> = { "₀": "0", "₁": "1", "₂": "2", "₃": "3", "₄": "4", "₅": "5", "₆": "6", "₇": "7", "₈": "8", "₉": "9" };
const FUNCTIONS = new Set(["tanh", "ln", "exp", "log", "sin", "cos", "max", "min"]);

const isLetter = (c: string) => /\p{L}/u.test(c) && !(c in GREEK);

function word(w: string): string {
  if (FUNCTIONS.has(w)) return `\\operatorname{${w}}`;
  if (w.length === 1) return w;
  return `\\mathrm{${w}}`;
}

function subscript(s: string): string {
  return `_{\\mathrm{${s.replace(/[^A-Za-z0-9,]/g, "")}}}`;
}

export function equationTex(equation: string): string {
  let out = "";
  let i = 0;
  const chars = [...equation];
  while (i < chars.length) {
    const c = chars[i]!;
    if (isLetter(c)) {
      let w = "";
      while (i < chars.length && isLetter(chars[i]!)) w += chars[i++];
      // A run of prose (three words or more in a row) is set as text.
      if (w.length > 3 && !FUNCTIONS.has(w) && w === w.toLowerCase() && chars[i] === " ") {
        let text = w;
        while (i < chars.length && /[\p{L} ,()'-]/u.test(chars[i]!) && !(chars[i]! in GREEK)) text += chars[i++];
        out += `\\text{${text}}`;
        continue;
      }
      out += word(w);
      continue;
    }
    if (c === "_") {
      let s = "";
      i++;
      while (i < chars.length && /[\p{L}0-9,]/u.test(chars[i]!)) s += chars[i++];
      out += subscript(s);
      continue;
    }
    if (c in SUBSCRIPTS) {
      let s = "";
      while (i < chars.length && chars[i]! in SUBSCRIPTS) s += SUBSCRIPTS[chars[i++]!];
      out += `_{${s}}`;
      continue;
    }
    if (c in SUPERSCRIPTS) {
      let s = "";
      while (i < chars.length && chars[i]! in SUPERSCRIPTS) s += SUPERSCRIPTS[chars[i++]!];
      out += `^{${s}}`;
      continue;
    }
    if (c === "^" && chars[i + 1] === "(") {
      // "Ra^(1/6)": the bracketed exponent becomes a TeX group.
      let depth = 0;
      let s = "";
      i++;
      do {
        const d = chars[i]!;
        if (d === "(") depth++;
        if (d === ")") depth--;
        s += d;
        i++;
      } while (i < chars.length && depth > 0);
      out += `^{${equationTex(s.slice(1, -1))}}`;
      continue;
    }
    if (c in GREEK) out += `${GREEK[c]} `;
    else if (c in SYMBOLS) out += SYMBOLS[c];
    else if (/[A-Za-z0-9 ()[\]=+\-/.,:<>!|']/.test(c)) out += c;
    else out += `\\text{${c}}`;
    i++;
  }
  return out;
}
