import Link from "next/link";
import { JoinInvitation } from "@/components/classes/join-invitation";
import { ApiError } from "@/lib/http/api-error";
import { currentUser } from "@/server/auth/session";
import { openInvitation, type OpenInvitation } from "@/server/classes/invitations";

export const metadata = { title: "Join a class" };

/** Where an invitation e-mail's link leads: open to visitors without an account. */
export default async function JoinPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const user = await currentUser();
  let invitation: OpenInvitation | null = null;
  let problem: string | null = null;
  try {
    invitation = await openInvitation(token);
  } catch (e) {
    if (!(e instanceof ApiError)) throw e;
    problem = e.message;
  }
  return (
    <div className="mx-auto max-w-md space-y-4 rounded-lg border border-line bg-white/60 p-5">
      <h1 className="text-xl font-semibold">Join a class</h1>
      {problem || !invitation ? (
        <>
          <p role="alert" className="text-sm text-over">{problem}</p>
          <p className="text-sm"><Link href="/classes" className="text-ember underline">Classroom</Link> — a join code from your instructor works too.</p>
        </>
      ) : (
        <>
          <p className="text-sm">You are invited to <strong>{invitation.className}</strong>{invitation.term ? ` (${invitation.term})` : ""}.{user && <> You are signed in as {user.displayName}.</>}</p>
          <JoinInvitation token={token} signedIn={user !== null} email={invitation.email} />
        </>
      )}
    </div>
  );
}
