const MAX_LENGTH = 200;
const MAX_EXTENSION = 10; // longer "extensions" are just a dot inside a name
const FALLBACK = "document";

/**
 * Makes an uploaded name safe to store and show: no folders (a name like "..\\..\\x.pdf" or
 * "C:\\Users\\…\\x.pdf" keeps only "x.pdf"), no control characters, no leading dots that would
 * hide it on disk, at most 200 characters with the extension kept. Never returns "".
 */
export function cleanFileName(name: string): string {
  const base = name.split(/[/\\]/).pop() ?? "";
  const visible = base
    .normalize("NFC")
    .replace(/\s+/g, " ") // tabs and line breaks first, so they separate words rather than join them
    .replace(/[\p{Cc}\p{Cf}]/gu, "") // other controls, bidi overrides, zero-width marks
    .trim()
    .replace(/^[.\s]+/, "");
  if (!visible.replace(/[.\s]/g, "")) return FALLBACK;
  return capLength(visible);
}

function capLength(name: string): string {
  const chars = Array.from(name); // cut on characters, never inside a surrogate pair
  if (chars.length <= MAX_LENGTH) return name;
  const dot = name.lastIndexOf(".");
  const extension = dot > 0 ? Array.from(name.slice(dot)) : [];
  const keep = extension.length > 1 && extension.length <= MAX_EXTENSION + 1 ? extension : [];
  const stem = chars.slice(0, MAX_LENGTH - keep.length).join("").trimEnd();
  return stem + keep.join("");
}
