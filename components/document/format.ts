// Formatting shared by the document, history and models screens. Times are shown in UTC so the
// server and the browser render the same text (and the record reads the same to everyone).

/** "2026-12-01 14:03" from an ISO time, in UTC. */
export function formatUtc(iso: string, withSeconds = false): string {
  return iso.slice(0, withSeconds ? 19 : 16).replace("T", " ");
}

/** 0.873 → "87%"; with digits, 0.9731 → "97.3%". */
export function formatPercent(value: number, digits = 0): string {
  return `${(value * 100).toFixed(digits)}%`;
}

export function formatSize(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(0)} KB`;
  const mb = bytes / 1024 / 1024;
  return `${Number.isInteger(mb) ? mb : mb.toFixed(1)} MB`;
}

/** 83_000 → "1 min 23 s"; 4_200 → "4.2 s". */
export function formatDuration(ms: number): string {
  if (ms < 10_000) return `${(ms / 1000).toFixed(1)} s`;
  const s = Math.round(ms / 1000);
  if (s < 60) return `${s} s`;
  const m = Math.floor(s / 60);
  if (m < 60) return `${m} min ${s % 60} s`;
  return `${Math.floor(m / 60)} h ${m % 60} min`;
}

const KINDS: Record<string, string> = {
  "application/pdf": "PDF",
  "application/vnd.openxmlformats-officedocument.wordprocessingml.document": "Word (.docx)",
  "image/png": "PNG image",
  "image/jpeg": "JPEG image",
  "image/tiff": "TIFF image",
};

/** A media type as a person names the file kind. */
export function formatKind(mediaType: string): string {
  return KINDS[mediaType.split(";")[0].trim()] ?? mediaType;
}
