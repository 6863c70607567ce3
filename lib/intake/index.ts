// The intake toolkit: pure, server-side, no database and no network. The upload route calls
// `sniffFile`, `cleanFileName` and `sha256Hex`; the reading job calls `readDocument` and the
// sensitive-identifier functions; server shutdown calls `shutdownOcr`.
export { cleanFileName } from "./clean-file-name";
export { ACCEPTED_KINDS, findKindByMediaType } from "./file-kinds";
export { sha256Hex } from "./hash";
export { shutdownOcr } from "./ocr-engine";
export { Deadline } from "./deadline";
export { readDocument } from "./read-document";
export { readDocx } from "./read-docx";
export { readImage } from "./read-image";
export { readPdf } from "./read-pdf";
export { DEFAULT_READ_OPTIONS } from "./read-options";
export { countSensitive, findSensitive, maskSensitive } from "./sensitive";
export type { SensitiveCounts, SensitiveKind, SensitiveMatch } from "./sensitive";
export { checkFileSize, DEFAULT_MAX_UPLOAD_BYTES, sniffFile } from "./sniff-file";
export type * from "./types";
