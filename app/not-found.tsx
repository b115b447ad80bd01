import Link from "next/link";

export default function NotFound() {
  return (
    <section className="mx-auto max-w-xl space-y-3">
      <h1 className="text-xl font-semibold">Not here</h1>
      <p className="text-sm text-ink-soft">
        This page does not exist, or it is not shared with you. <Link href="/" className="text-ember">Home</Link>
      </p>
    </section>
  );
}
