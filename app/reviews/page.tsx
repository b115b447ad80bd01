import { ComingNext } from "@/components/ui/coming-next";
import { requirePageUser } from "@/server/auth/session";

export const metadata = { title: "Review desk" };

export default async function ReviewDeskPage() {
  await requirePageUser("reviewer", "admin");
  return <ComingNext title="Review desk">Builds waiting for your verdict, with comments pinned to the heat path.</ComingNext>;
}
