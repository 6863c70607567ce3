import { SetupSkeleton } from "@/components/setup/table-skeleton";

export default function Loading() {
  return <SetupSkeleton title="Setup" rows={3} />;
}
