import { ComingNext } from "@/components/ui/coming-next";
import { requirePageUser } from "@/server/auth/session";

export const metadata = { title: "Part" };

export default async function Page() {
  await requirePageUser();
  return <ComingNext title="Part">A part record: fields, curves and attachments.</ComingNext>;
}
