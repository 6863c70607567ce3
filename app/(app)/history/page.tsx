import type { Metadata } from "next";
import { AreaPlaceholder } from "@/components/shell/area-page";

export const metadata: Metadata = { title: "History" };

export default function HistoryPage() {
  return <AreaPlaceholder href="/history" />;
}
