import Link from "next/link";
import { Button } from "@/components/ui/button";

interface FormFooterProps {
  /** The server's sentence when it refused the form, shown where the person acts. */
  serverError: string | null;
  busy: boolean;
  /** True when the form edits an existing row ("Save changes"), false when it adds one. */
  editing: boolean;
  addLabel: string;
  saveTestId: string;
  cancelHref: string;
}

/** The end of every Setup form: the server's refusal, Save (or Add), and Cancel. */
export function FormFooter({ serverError, busy, editing, addLabel, saveTestId, cancelHref }: FormFooterProps) {
  return (
    <>
      {serverError && (
        <p role="alert" className="rounded bg-brick-light/60 px-3 py-2 text-sm text-brick" data-testid="form-error">
          {serverError}
        </p>
      )}
      <div className="flex items-center gap-3">
        <Button type="submit" disabled={busy} data-testid={saveTestId}>
          {busy ? "Saving…" : editing ? "Save changes" : addLabel}
        </Button>
        <Link href={cancelHref} className="text-sm text-verdigris hover:underline" scroll={false}>
          Cancel
        </Link>
      </div>
    </>
  );
}
