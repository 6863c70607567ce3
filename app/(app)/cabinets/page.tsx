import type { Metadata } from "next";
import { AreaPlaceholder } from "@/components/shell/area-page";

export const metadata: Metadata = { title: "Cabinets" };

export default function CabinetsPage() {
  return <AreaPlaceholder href="/cabinets" />;
}
