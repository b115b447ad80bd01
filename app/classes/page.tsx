import { ComingNext } from "@/components/ui/coming-next";
import { requirePageUser } from "@/server/auth/session";

export const metadata = { title: "Classroom" };

export default async function Page() {
  await requirePageUser();
  return <ComingNext title="Classroom">Classes, worked examples and assignments.</ComingNext>;
}
