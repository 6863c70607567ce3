import { cn } from "@/lib/utils";

export const INPUT = "w-full rounded border border-paper-edge bg-white px-2 py-1.5 text-sm focus:outline-2 focus:outline-verdigris aria-[invalid=true]:border-brick";

interface FieldProps {
  id: string;
  label: string;
  hint?: string;
  error?: string;
  children: React.ReactNode;
  className?: string;
}

/** A labelled form field with its hint and, when there is one, its sentence of what to fix. */
export function Field({ id, label, hint, error, children, className }: FieldProps) {
  return (
    <div className={cn("space-y-1", className)}>
      <label htmlFor={id} className="block text-xs font-medium text-ink-soft">
        {label}
      </label>
      {children}
      {hint && !error && <p className="text-xs text-ink-faint">{hint}</p>}
      {error && (
        <p id={`${id}-error`} className="text-xs text-brick" data-testid={`error-${id}`}>
          {error}
        </p>
      )}
    </div>
  );
}

/** The props that tie an input to its field's error for screen readers. */
export const described = (id: string, error?: string) => ({ id, "aria-invalid": Boolean(error), "aria-describedby": error ? `${id}-error` : undefined });
