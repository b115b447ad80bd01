import type { Derivation, DerivationQuantity, DerivationStep } from "@/lib/classroom/derivation";
import { VERDICT_STYLE } from "@/components/budget/format";
import { AnswerBox } from "./answer-box";
import { fmtValue } from "./format";
import { Tex } from "./tex";

type Props = { derivation: Derivation; exampleId: string | null; hiddenKeys?: readonly string[]; open?: boolean };

/** A value, or the question in its place when it is hidden from the viewer. */
function Value({ q, exampleId, hiddenKeys }: { q: DerivationQuantity; exampleId: string | null; hiddenKeys?: readonly string[] }) {
  if (q.hidden) return exampleId && q.ref ? <AnswerBox exampleId={exampleId} refKey={q.ref} unit={q.unit} label={q.name} /> : <span className="rounded bg-ember-soft px-1.5 font-mono text-ember">?</span>;
  const marked = q.ref && hiddenKeys?.includes(q.ref);
  return (
    <span className="font-mono">
      {fmtValue(q.value, q.unit)}
      {marked && <span className="ml-1 rounded bg-ember-soft px-1 font-sans text-[10px] text-ember" title="hidden from students until revealed">hidden</span>}
    </span>
  );
}

function Step({ step, exampleId, hiddenKeys, open, depth = 0 }: { step: DerivationStep; exampleId: string | null; hiddenKeys?: readonly string[]; open: boolean; depth?: number }) {
  return (
    <details open={open} className={`step rounded border border-line bg-white/70 p-2 ${depth ? "mt-1" : ""}`} data-testid="derivation-step">
      <summary className="cursor-pointer">
        <span className="font-medium">{step.title}</span>
        <span className="mx-1 text-ink-soft">—</span>
        <span className="text-ink-soft">{step.result.symbol} =</span> <Value q={step.result} exampleId={exampleId} hiddenKeys={hiddenKeys} />
      </summary>
      <div className="mt-1.5 space-y-1 pl-3 text-xs">
        <div>{step.formula}: <Tex tex={step.tex} fallback={step.equation} /></div>
        {step.inputs.length > 0 && (
          <table className="text-xs">
            <tbody>
              {step.inputs.map((q, i) => (
                <tr key={`${q.symbol}-${i}`}>
                  <td className="pr-2 font-mono">{q.symbol}</td>
                  <td className="pr-2"><Value q={q} exampleId={null} hiddenKeys={hiddenKeys} /></td>
                  <td className="text-ink-soft">{q.name}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
        <div className="text-ink-soft">Source: {step.source}</div>
        {step.validity && <div className={step.validity.inRange ? "text-ink-soft" : "text-tight"}>Valid for {step.validity.range}{step.validity.inRange ? "" : " — used outside this range here"}</div>}
        {step.notes.map((n) => <div key={n} className="text-ink-soft">Note: {n}</div>)}
        {/* Sub-models stay folded even on the handout: the link's own line carries the figure. */}
        {step.parts.map((p) => <Step key={p.key} step={p} exampleId={null} hiddenKeys={hiddenKeys} open={false} depth={depth + 1} />)}
      </div>
    </details>
  );
}

/**
 * The derivation in the order a student works it. Steps are <details>: they fold and unfold
 * without script, and the printed handout opens them all.
 */
export function DerivationView({ derivation: d, exampleId, hiddenKeys, open = false }: Props) {
  return (
    <div className="derivation space-y-5 text-sm">
      <p className="text-ink-soft">Case: <strong className="text-ink">{d.scenarioLabel}</strong>{d.ambientC !== null && <> · surrounding air {fmtValue(d.ambientC, "°C")}</>}</p>
      <section className="space-y-1.5">
        <h3 className="font-medium">1. Heat from the electrical side</h3>
        <div className="step-list space-y-1.5">{d.heat.map((s) => <Step key={s.key} step={s} exampleId={exampleId} hiddenKeys={hiddenKeys} open={open} />)}</div>
      </section>
      <section className="space-y-1.5">
        <h3 className="font-medium">2. Each link&apos;s resistance</h3>
        <div className="step-list space-y-1.5">{d.links.map((s) => <Step key={s.key} step={s} exampleId={exampleId} hiddenKeys={hiddenKeys} open={open} />)}</div>
      </section>
      <section className="space-y-1.5">
        <h3 className="font-medium">3. The network solution: each node&apos;s balance</h3>
        <p className="text-xs text-ink-soft">At every node the heat put in equals the heat carried away along its links (a negative flow arrives). The solver finds the temperatures at which all balances close at once.</p>
        <div className="step-list space-y-1.5">
        {d.network.map((n) => (
          <details key={n.key} open={open} className="step rounded border border-line bg-white/70 p-2" data-testid="node-balance">
            <summary className="cursor-pointer"><span className="font-medium">{n.place}</span> <span className="text-ink-soft">T =</span> <Value q={n.temperature} exampleId={exampleId} hiddenKeys={hiddenKeys} /></summary>
            <table className="mt-1 pl-3 text-xs">
              <tbody>
                <tr><td className="pr-3">heat put in here</td><td className="font-mono">{n.sourceW === null ? "?" : fmtValue(n.sourceW, "W")}</td></tr>
                {n.flows.map((f, i) => (
                  <tr key={i}><td className="pr-3">{f.watts >= 0 ? "to" : "from"} {f.other} <span className="text-ink-soft">({f.link})</span></td><td className="font-mono">{fmtValue(f.watts, "W")}</td></tr>
                ))}
                <tr><td className="pr-3 text-ink-soft">in − out</td><td className="font-mono text-ink-soft">{fmtValue(n.residualW, "W")}</td></tr>
              </tbody>
            </table>
          </details>
        ))}
        </div>
      </section>
      <section className="space-y-1.5">
        <h3 className="font-medium">4. Limits and the verdict</h3>
        <table className="w-full text-xs">
          <thead><tr className="text-left text-ink-soft"><th className="pr-2 font-normal">place</th><th className="pr-2 font-normal">temperature</th><th className="pr-2 font-normal">limit</th><th className="pr-2 font-normal">headroom</th><th className="font-normal">source of the limit</th></tr></thead>
          <tbody>
            {d.limits.map((l) => (
              <tr key={l.key} className="align-top">
                <td className="pr-2">{l.place}{l.kind === "min" ? " (lower limit)" : ""}</td>
                <td className="whitespace-nowrap pr-2"><Value q={l.temperature} exampleId={null} hiddenKeys={hiddenKeys} /></td>
                <td className="whitespace-nowrap pr-2 font-mono">{fmtValue(l.limit.value, "°C")}</td>
                <td className="whitespace-nowrap pr-2"><Value q={l.headroom} exampleId={exampleId} hiddenKeys={hiddenKeys} /></td>
                <td className="text-ink-soft">{l.source}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <p>
          Verdict:{" "}
          {d.verdict.hidden ? <span className="rounded bg-ember-soft px-1.5 text-ember">? (work out the headroom first)</span> : d.verdict.value ? <span className={`rounded border px-1.5 ${VERDICT_STYLE[d.verdict.value] ?? ""}`}>{d.verdict.value}</span> : "–"}
          <span className="ml-2 text-xs text-ink-soft">within budget: 10 K or more headroom on every limit; tight: 0–10 K; over budget: a limit exceeded.</span>
        </p>
      </section>
    </div>
  );
}

function inputsLine(step: DerivationStep): string {
  return step.inputs.map((q) => `${q.symbol} = ${q.hidden ? "?" : fmtValue(q.value, q.unit)}`).join(", ");
}

function valueText(q: DerivationQuantity): string {
  return q.hidden ? "____" : fmtValue(q.value, q.unit);
}

/** The handout's derivation: the same steps, each in two or three printed lines, blanks for the questions. */
export function HandoutDerivation({ derivation: d }: { derivation: Derivation }) {
  const step = (s: DerivationStep) => (
    <li key={s.key} className="break-inside-avoid">
      <strong>{s.title}</strong> — {s.formula}: <Tex tex={s.tex} fallback={s.equation} /> → <span className="font-mono">{s.result.symbol} = {valueText(s.result)}</span>
      {s.inputs.length > 0 && <div className="text-ink-soft">{inputsLine(s)}</div>}
      <div className="text-[0.9em] italic text-ink-soft">{s.source}</div>
    </li>
  );
  return (
    <div className="handout-derivation space-y-2 text-xs">
      <p>Case: <strong>{d.scenarioLabel}</strong>{d.ambientC !== null && <> · surrounding air {fmtValue(d.ambientC, "°C")}</>}</p>
      <h3 className="font-medium">1. Heat from the electrical side</h3>
      <ol className="step-list space-y-1">{d.heat.map(step)}</ol>
      <h3 className="font-medium">2. Each link&apos;s resistance</h3>
      <ol className="step-list space-y-1">{d.links.map(step)}</ol>
      <h3 className="font-medium">3. The network solution: each node&apos;s balance (heat in = heat out)</h3>
      <ul className="step-list space-y-0.5">
        {d.network.map((n) => (
          <li key={n.key} className="break-inside-avoid">
            <strong>{n.place}</strong>: T = <span className="font-mono">{valueText(n.temperature)}</span>; put in {n.sourceW === null ? "____" : fmtValue(n.sourceW, "W")}
            {n.flows.length > 0 && <>; {n.flows.map((f) => `${f.watts >= 0 ? "to" : "from"} ${f.other} ${fmtValue(Math.abs(f.watts), "W")}`).join(", ")}</>}
          </li>
        ))}
      </ul>
      <h3 className="font-medium">4. Limits and the verdict</h3>
      <ul className="space-y-0.5">
        {d.limits.map((l) => (
          <li key={l.key}>
            <strong>{l.place}</strong>{l.kind === "min" ? " (lower limit)" : ""}: {valueText(l.temperature)} against {fmtValue(l.limit.value, "°C")}, headroom {valueText(l.headroom)} <span className="italic text-ink-soft">({l.source})</span>
          </li>
        ))}
      </ul>
      <p>Verdict: <strong>{d.verdict.hidden ? "____" : (d.verdict.value ?? "–")}</strong> <span className="text-ink-soft">(within budget: ≥ 10 K headroom on every limit; tight: 0–10 K; over budget: a limit exceeded)</span></p>
    </div>
  );
}
