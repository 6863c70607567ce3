import { Deadline } from "./deadline";
import { recognizeImage } from "./ocr-engine";
import { describeDamagedImage, UnreadableError } from "./unreadable";

export interface ImageText {
  text: string;
  pageCount: 1;
}

/**
 * OCRs a PNG, JPEG or TIFF. Only the first image of a multi-page TIFF is read: leptonica, inside
 * tesseract.js, decodes one frame.
 */
export async function readImage(bytes: Uint8Array, deadline: Deadline): Promise<ImageText> {
  try {
    return { text: await recognizeImage(bytes, deadline), pageCount: 1 };
  } catch (error) {
    if (error instanceof UnreadableError) throw error;
    // tesseract.js rejects with a bare string or Error, e.g. "Error attempting to read image."
    throw new UnreadableError("image_damaged", describeDamagedImage(), String(error));
  }
}
