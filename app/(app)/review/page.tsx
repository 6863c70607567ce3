import type { Metadata } from "next";
import { AreaPlaceholder } from "@/components/shell/area-page";

export const metadata: Metadata = { title: "To review" };

export default function ReviewPage() {
  return <AreaPlaceholder href="/review" />;
}
