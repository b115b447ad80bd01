import Link from "next/link";
import { currentUser } from "@/server/auth/session";

export default async function HomePage() {
  const user = await currentUser().catch(() => null);
  return (
    <div className="space-y-10">
      <section className="grid gap-8 md:grid-cols-[3fr_2fr] md:items-center">
        <div className="space-y-4">
          <h1 className="text-3xl font-semibold tracking-tight md:text-4xl">
            Will it stay cool enough? Know before you glue.
          </h1>
          <p className="text-ink-soft">
            Sinkwise works out the thermal budget of an LED retrofit: the emitter, its driver, the
            Li-ion pack and the charger, in the housing you really have and on the heatsink you
            really salvaged. For each brightness mode and while charging it tells you how hot each
            part gets, for how long a mode can run, how bright it stays and whether the case is
            safe to hold.
          </p>
          <div className="flex gap-3">
            <Link href="/check" className="rounded bg-ember px-4 py-2 text-sm font-medium text-white hover:opacity-90">
              Try the quick check
            </Link>
            {user ? (
              <Link href="/builds" className="rounded border border-line px-4 py-2 text-sm hover:border-ember">
                Your builds
              </Link>
            ) : (
              <Link href="/signin" className="rounded border border-line px-4 py-2 text-sm hover:border-ember">
                Sign in
              </Link>
            )}
          </div>
        </div>
        <figure className="rounded-lg border border-line bg-white/60 p-5 text-sm">
          <figcaption className="mb-3 font-medium">The heat path, rung by rung</figcaption>
          <ol className="space-y-1.5 font-mono text-xs">
            <li>junction → solder point · Rth(j-sp)</li>
            <li>board → heatsink · interface layer</li>
            <li>heatsink → housing air · fins, convection, radiation</li>
            <li>housing wall → your hand · touch limit</li>
          </ol>
          <div className="temp-scale mt-4 h-2 rounded" aria-hidden />
        </figure>
      </section>
      <section className="grid gap-4 md:grid-cols-3">
        {[
          ["Makers and repair techs", "Check a salvaged heatsink at every mode, find which mode needs a timer, see runtime and charge time."],
          ["Reviewers", "Put heat-path alternatives side by side and record a verdict with comments."],
          ["Instructors", "Publish worked examples whose every number traces to a formula, its inputs and a source."],
        ].map(([title, text]) => (
          <div key={title} className="rounded-lg border border-line bg-white/50 p-4">
            <h2 className="mb-1 font-medium">{title}</h2>
            <p className="text-sm text-ink-soft">{text}</p>
          </div>
        ))}
      </section>
      <section className="rounded-lg border border-tight/40 bg-tight/5 p-4 text-sm">
        <h2 className="mb-1 font-medium">Safety</h2>
        <p className="text-ink-soft">
          Results are estimates. Li-ion cells can catch fire: never charge unattended, use a
          protection circuit, never use damaged cells, and spot-weld rather than solder them. Hot
          surfaces burn; bright emitters can hurt eyes. Mains wiring is for local codes and
          licensed practice. Test the real build with a thermocouple.
        </p>
      </section>
    </div>
  );
}
