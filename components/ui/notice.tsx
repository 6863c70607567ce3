import { cn } from "@/lib/utils";

interface NoticeProps {
  tone?: "info" | "warning" | "error";
  title?: string;
  children: React.ReactNode;
  className?: string;
}

/** A boxed message; the tone is also said in words (role="alert" for errors), never colour alone. */
export function Notice({ tone = "info", title, children, className }: NoticeProps) {
  return (
    <div
      role={tone === "error" ? "alert" : "status"}
      className={cn(
        "rounded border-l-4 px-4 py-3 text-sm",
        tone === "info" && "border-verdigris bg-verdigris-light/50",
        tone === "warning" && "border-amber bg-amber-light/60",
        tone === "error" && "border-brick bg-brick-light/60",
        className,
      )}
    >
      {title && <p className="mb-1 font-semibold">{title}</p>}
      {children}
    </div>
  );
}
