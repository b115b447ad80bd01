import { ComingNext } from "@/components/ui/coming-next";
import { requirePageUser } from "@/server/auth/session";

export const metadata = { title: "Report" };

export default async function Page() {
  await requirePageUser();
  return <ComingNext title="Report">A printable one-page summary.</ComingNext>;
}
