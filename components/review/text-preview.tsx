import { MarkedWords, markStems } from "@/components/ui/marked-words";

/** The text read, with the words behind the "why" terms marked (see markStems). */
export function TextPreview({ text, terms }: { text: string; terms: string[] }) {
  return (
    <div className="max-h-[50vh] overflow-auto whitespace-pre-wrap rounded border border-paper-edge bg-white p-3 text-[13px] leading-relaxed">
      <MarkedWords text={text} stems={markStems(terms)} />
    </div>
  );
}
