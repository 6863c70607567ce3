// Moved to components/ui so every area can use it; kept here so existing imports still work.
export { ConfirmDialog } from "@/components/ui/confirm-dialog";
