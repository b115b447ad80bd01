import { DerivationView } from "@/components/classes/derivation-view";
import { Markdown } from "@/components/classes/markdown";
import { ApiError } from "@/lib/http/api-error";
import { openExampleLink } from "@/server/classes/link";

export const metadata = { title: "Worked example" };

/** A worked example opened by its link: read-only, no sign-in, the questions stay blank. */
export default async function ExampleLinkPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  let view: Awaited<ReturnType<typeof openExampleLink>> | null = null;
  let problem: string | null = null;
  try {
    view = await openExampleLink(token);
  } catch (e) {
    if (!(e instanceof ApiError)) throw e;
    problem = e.message;
  }
  if (!view) return <p role="alert" className="text-sm text-over">{problem}</p>;
  return (
    <article className="space-y-4">
      <div>
        <h1 className="text-2xl font-semibold">{view.example.title}</h1>
        <p className="text-sm text-ink-soft">A worked example by {view.example.authorName}: revision {view.example.revision} of “{view.example.buildTitle}”. Read-only.</p>
      </div>
      {view.example.narrative.trim() && <div className="rounded-lg border border-line bg-white/60 p-3"><Markdown text={view.example.narrative} /></div>}
      {view.derivation && <DerivationView derivation={view.derivation} exampleId={null} />}
    </article>
  );
}
