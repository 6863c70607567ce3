// How a refused kind is named to a clerk, with the step that usually gets it in. Keys are the
// extensions file-type reports. Kinds not listed get a plain "a .xyz file".

interface RejectedKind {
  label: string;
  /** Programs, archives and media are "not a document"; office files are documents we don't read. */
  notDocument: boolean;
  advice?: string;
}

const SAVE_AS_PDF = "Open it, save or print it as PDF, and upload that.";
const SAVE_AS_DOCX = "Open it in Word, save it as .docx or PDF, and upload that.";
const UNZIP = "Unpack it and upload the documents inside.";
const AS_IMAGE = "Save it as PNG or JPEG and upload that.";

const PROGRAM = { notDocument: true, advice: "Do not open it; ask the sender what they meant to send." };

const KINDS: Record<string, RejectedKind> = {
  exe: { label: "a Windows program (.exe)", ...PROGRAM },
  elf: { label: "a Linux program", ...PROGRAM },
  macho: { label: "a Mac program", ...PROGRAM },
  apk: { label: "an Android app (.apk)", ...PROGRAM },
  jar: { label: "a Java program (.jar)", ...PROGRAM },
  class: { label: "a Java program part (.class)", ...PROGRAM },
  wasm: { label: "a WebAssembly program (.wasm)", ...PROGRAM },
  lnk: { label: "a Windows shortcut (.lnk)", ...PROGRAM },
  zip: { label: "a zip archive (.zip)", notDocument: true, advice: UNZIP },
  "7z": { label: "a 7-Zip archive (.7z)", notDocument: true, advice: UNZIP },
  rar: { label: "a RAR archive (.rar)", notDocument: true, advice: UNZIP },
  gz: { label: "a gzip archive (.gz)", notDocument: true, advice: UNZIP },
  tar: { label: "a tar archive (.tar)", notDocument: true, advice: UNZIP },
  xlsx: { label: "an Excel workbook (.xlsx)", notDocument: false, advice: SAVE_AS_PDF },
  pptx: { label: "a PowerPoint presentation (.pptx)", notDocument: false, advice: SAVE_AS_PDF },
  cfb: { label: "an older Office file (.doc, .xls or .ppt)", notDocument: false, advice: SAVE_AS_DOCX },
  rtf: { label: "a Rich Text file (.rtf)", notDocument: false, advice: SAVE_AS_DOCX },
  odt: { label: "an OpenDocument text (.odt)", notDocument: false, advice: SAVE_AS_DOCX },
  epub: { label: "an e-book (.epub)", notDocument: false, advice: SAVE_AS_PDF },
  xml: { label: "an XML data file", notDocument: false, advice: SAVE_AS_PDF },
  heic: {
    label: "an iPhone photo in HEIC format",
    notDocument: false,
    advice: "Export it as JPEG (or set the camera to Most Compatible) and upload that.",
  },
  gif: { label: "a GIF image", notDocument: false, advice: AS_IMAGE },
  webp: { label: "a WebP image", notDocument: false, advice: AS_IMAGE },
  bmp: { label: "a BMP image", notDocument: false, advice: AS_IMAGE },
  avif: { label: "an AVIF image", notDocument: false, advice: AS_IMAGE },
  mp3: { label: "a sound recording (.mp3)", notDocument: true },
  wav: { label: "a sound recording (.wav)", notDocument: true },
  mp4: { label: "a video (.mp4)", notDocument: true },
  mov: { label: "a video (.mov)", notDocument: true },
  pst: { label: "an Outlook mailbox (.pst)", notDocument: true, advice: "Save the messages or attachments you need as PDF and upload those." },
  sqlite: { label: "a database file", notDocument: true },
};

export function describeRejectedKind(extension: string): RejectedKind {
  return KINDS[extension] ?? { label: `a .${extension} file`, notDocument: false, advice: SAVE_AS_PDF };
}
