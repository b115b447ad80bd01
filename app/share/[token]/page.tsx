import { ComingNext } from "@/components/ui/coming-next";

export const metadata = { title: "Shared budget" };

export default function SharedPage() {
  return <ComingNext title="Shared budget">A read-only view of a build's Budget, opened from a share link.</ComingNext>;
}
