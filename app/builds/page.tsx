import { ComingNext } from "@/components/ui/coming-next";
import { requirePageUser } from "@/server/auth/session";

export const metadata = { title: "Builds" };

export default async function Page() {
  await requirePageUser();
  return <ComingNext title="Builds">Your retrofits and the ones shared with you.</ComingNext>;
}
