import { ComingNext } from "@/components/ui/coming-next";
import { requirePageUser } from "@/server/auth/session";

export const metadata = { title: "Parts bin" };

export default async function Page() {
  await requirePageUser();
  return <ComingNext title="Parts bin">Your part records — emitters, drivers, heatsinks, cells and more — with units, curves and datasheets.</ComingNext>;
}
