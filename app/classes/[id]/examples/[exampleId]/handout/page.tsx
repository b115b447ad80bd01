import "./handout.css";
import { notFound } from "next/navigation";
import { HandoutDerivation } from "@/components/classes/derivation-view";
import { Markdown } from "@/components/classes/markdown";
import { PrintButton } from "@/components/ui/print-button";
import { requirePageUser } from "@/server/auth/session";
import { exampleView } from "@/server/classes/examples";
import { loadExample, orNotFound } from "@/server/classes/load";

export const metadata = { title: "Handout" };

/** The printable handout: every step open, compact type, A4 margins; hidden values stay blanks to fill in. */
export default async function HandoutPage({ params }: { params: Promise<{ id: string; exampleId: string }> }) {
  const user = await requirePageUser();
  const { id, exampleId } = await params;
  const { example, cls } = await orNotFound(loadExample({ id: exampleId, viewer: user }));
  if (cls.id !== id) notFound();
  // The handout is what students get: the questions stay blank even when an instructor prints it.
  const view = await exampleView({ example, canTeach: false });
  return (
    <article className="handout mx-auto max-w-4xl space-y-3">
      <div className="no-print flex items-center gap-3 text-sm">
        <PrintButton />
        <span className="text-ink-soft">Fits two A4 pages; blanks are the questions.</span>
      </div>
      <header>
        <h1 className="text-xl font-semibold">{view.example.title}</h1>
        <p className="text-xs text-ink-soft">{cls.name}{cls.term ? ` · ${cls.term}` : ""} · revision {view.example.revision} of “{view.example.buildTitle}” · {view.example.authorName}</p>
      </header>
      {view.example.narrative.trim() && <Markdown text={view.example.narrative} />}
      {view.derivation && <HandoutDerivation derivation={view.derivation} />}
      <p className="text-[10px] text-ink-soft">Estimates from the build&apos;s parts; a thermocouple test of the real build is the final word. Sinkwise.</p>
    </article>
  );
}
