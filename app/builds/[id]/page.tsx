import { ComingNext } from "@/components/ui/coming-next";
import { requirePageUser } from "@/server/auth/session";

export const metadata = { title: "Heat path" };

export default async function Page() {
  await requirePageUser();
  return <ComingNext title="Heat path">The build editor.</ComingNext>;
}
