import { ComingNext } from "@/components/ui/coming-next";
import { requirePageUser } from "@/server/auth/session";

export const metadata = { title: "Side by side" };

export default async function Page() {
  await requirePageUser();
  return <ComingNext title="Side by side">Two to four builds or revisions with their deltas and overlaid warm-up curves.</ComingNext>;
}
