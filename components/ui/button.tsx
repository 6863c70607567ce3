import { cn } from "@/lib/utils";

interface ButtonProps extends React.ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: "primary" | "quiet" | "danger";
}

export function Button({ variant = "primary", className, ...props }: ButtonProps) {
  return (
    <button
      className={cn(
        "inline-flex items-center justify-center gap-2 rounded px-3 py-1.5 text-sm font-medium transition-colors disabled:cursor-not-allowed disabled:opacity-60",
        variant === "primary" && "bg-verdigris text-white hover:bg-verdigris-dark",
        variant === "quiet" && "border border-paper-edge bg-white/60 text-ink hover:bg-paper-deep",
        variant === "danger" && "bg-brick text-white hover:opacity-90",
        className,
      )}
      {...props}
    />
  );
}
