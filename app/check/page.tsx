import { ComingNext } from "@/components/ui/coming-next";

export const metadata = { title: "Quick check" };

export default function QuickCheckPage() {
  return (
    <ComingNext title="Quick check">
      One emitter power, one heatsink (declared K/W or measured) and the ambient temperature give
      the junction and sink temperatures, a verdict and the sink resistance you need. No account
      needed.
    </ComingNext>
  );
}
