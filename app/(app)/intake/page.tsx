import type { Metadata } from "next";
import { AreaPlaceholder } from "@/components/shell/area-page";

export const metadata: Metadata = { title: "Intake" };

export default function IntakePage() {
  return <AreaPlaceholder href="/intake" />;
}
