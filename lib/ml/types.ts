// Shapes shared by the modules of lib/ml. Labels are plain strings (cabinet type ids or names)
// so the engine knows nothing about the app that calls it.

/** One document as the app or the command line hands it over. */
export interface MlDocument {
  text: string;
  filename?: string;
  meta?: DocumentMeta;
  /** The reader's heading (e.g. a PDF's largest-type first-page lines); else the text's start is used. */
  heading?: string;
}

/** A few facts about the file that carry signal beyond its words. */
export interface DocumentMeta {
  /** File kind such as "pdf", "docx", "jpeg". */
  kind?: string;
  pages?: number;
  /** True when the text came from OCR. */
  ocr?: boolean;
}

/** A labelled document for training and evaluation. */
export interface LabelledDocument extends MlDocument {
  label: string;
}
