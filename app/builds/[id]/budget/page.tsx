import { ComingNext } from "@/components/ui/coming-next";
import { requirePageUser } from "@/server/auth/session";

export const metadata = { title: "Budget" };

export default async function Page() {
  await requirePageUser();
  return <ComingNext title="Budget">Headroom per limit, the temperature ladder, warm-up curves and runtime.</ComingNext>;
}
