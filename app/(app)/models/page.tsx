import type { Metadata } from "next";
import { AreaPlaceholder } from "@/components/shell/area-page";

export const metadata: Metadata = { title: "Models" };

export default function ModelsPage() {
  return <AreaPlaceholder href="/models" />;
}
