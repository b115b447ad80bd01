import { env } from "@/server/env";

/** On a server whose mail goes to the local test inbox (the demo), says where to read it. */
export function LocalInboxNote() {
  const inbox = env().MAIL_INBOX_URL;
  if (!inbox) return null;
  return (
    <p className="mt-4 rounded border border-line bg-white/60 px-3 py-2 text-xs text-ink-soft">
      This server sends its mail to a local test inbox, not to the internet: read it at{" "}
      <a href={inbox} target="_blank" rel="noreferrer" className="underline hover:text-ember">
        {inbox}
      </a>
      .
    </p>
  );
}
