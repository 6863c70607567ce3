import type { FileKind } from "./types";

export interface KindInfo {
  mediaType: string;
  extension: string;
}

/** The kinds Foldwright keeps, with the media type and extension file-type reports for each. */
export const ACCEPTED_KINDS: Readonly<Record<FileKind, KindInfo>> = {
  pdf: { mediaType: "application/pdf", extension: "pdf" },
  docx: {
    mediaType: "application/vnd.openxmlformats-officedocument.wordprocessingml.document",
    extension: "docx",
  },
  png: { mediaType: "image/png", extension: "png" },
  jpeg: { mediaType: "image/jpeg", extension: "jpg" },
  tiff: { mediaType: "image/tiff", extension: "tif" },
};

export const ACCEPTED_SENTENCE = "Foldwright keeps PDF, Word (.docx), PNG, JPEG and TIFF files.";

export function findKindByMediaType(mediaType: string): FileKind | undefined {
  const bare = mediaType.split(";")[0]?.trim().toLowerCase();
  const entry = Object.entries(ACCEPTED_KINDS).find(([, info]) => info.mediaType === bare);
  return entry?.[0] as FileKind | undefined;
}
