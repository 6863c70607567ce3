import type { Metadata } from "next";
import { AreaPlaceholder } from "@/components/shell/area-page";

export const metadata: Metadata = { title: "Setup" };

export default function SetupPage() {
  return <AreaPlaceholder href="/setup" />;
}
