// The model file: 8 magic bytes "FWMODEL\0", a little-endian uint32 header length, the header
// as UTF-8 JSON (kind, format version, classes, options, counts, metrics, and where each block
// lies), then binary blocks at 8-byte boundaries: idf (float64), intercepts (float64), weights
// (float32, classes × terms) and the terms (UTF-8, newline-separated; tokens never hold one).
// Loading checks the magic, kind, version and every block's size before trusting anything.
import { indexTerms } from "./tfidf";
import { MODEL_FORMAT_VERSION, MODEL_KIND, type FoldwrightModel } from "./model";

const MAGIC = "FWMODEL\0";

type BlockName = "idf" | "intercepts" | "weights" | "terms";
interface Block {
  offset: number;
  byteLength: number;
}

interface Header {
  kind: string;
  formatVersion: number;
  classes: string[];
  termCount: number;
  options: FoldwrightModel["options"];
  counts: FoldwrightModel["counts"];
  metrics: unknown;
  createdAt: string;
  blocks: Record<BlockName, Block>;
}

const align8 = (n: number) => Math.ceil(n / 8) * 8;

/** Serialises a model to bytes (write them to a file or an S3 object). */
export function saveModel(model: FoldwrightModel): Uint8Array {
  const termsBytes = new TextEncoder().encode(model.terms.join("\n"));
  const parts: Array<[BlockName, Uint8Array]> = [
    ["idf", new Uint8Array(model.vocabulary.idf.buffer, model.vocabulary.idf.byteOffset, model.vocabulary.idf.byteLength)],
    ["intercepts", new Uint8Array(model.intercepts.buffer, model.intercepts.byteOffset, model.intercepts.byteLength)],
    ["weights", new Uint8Array(model.weights.buffer, model.weights.byteOffset, model.weights.byteLength)],
    ["terms", termsBytes],
  ];
  const blocks = {} as Record<BlockName, Block>;
  let offset = 0;
  for (const [name, bytes] of parts) {
    blocks[name] = { offset, byteLength: bytes.byteLength };
    offset = align8(offset + bytes.byteLength);
  }
  const header: Header = {
    kind: model.kind,
    formatVersion: model.formatVersion,
    classes: model.classes,
    termCount: model.terms.length,
    options: model.options,
    counts: model.counts,
    metrics: model.metrics,
    createdAt: model.createdAt,
    blocks,
  };
  const headerBytes = new TextEncoder().encode(JSON.stringify(header));
  const bodyStart = align8(12 + headerBytes.byteLength);
  const out = new Uint8Array(bodyStart + offset);
  out.set(new TextEncoder().encode(MAGIC), 0);
  new DataView(out.buffer).setUint32(8, headerBytes.byteLength, true);
  out.set(headerBytes, 12);
  for (const [name, bytes] of parts) out.set(bytes, bodyStart + blocks[name].offset);
  return out;
}

/** Reads the header and checks kind, version and block sizes. */
function readHeader(bytes: Uint8Array): { header: Header; bodyStart: number } {
  if (bytes.byteLength < 12 || new TextDecoder().decode(bytes.subarray(0, 8)) !== MAGIC) {
    throw new Error("This file is not a Foldwright model (wrong magic bytes).");
  }
  const headerLength = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength).getUint32(8, true);
  if (12 + headerLength > bytes.byteLength) throw new Error("The model file is cut short (header).");
  const header = JSON.parse(new TextDecoder().decode(bytes.subarray(12, 12 + headerLength))) as Header;
  if (header.kind !== MODEL_KIND) throw new Error(`This file holds a "${header.kind}", not a ${MODEL_KIND}.`);
  if (header.formatVersion !== MODEL_FORMAT_VERSION) {
    throw new Error(`Model format version ${header.formatVersion} is not supported (this code reads ${MODEL_FORMAT_VERSION}); retrain the model.`);
  }
  const bodyStart = align8(12 + headerLength);
  const k = header.classes.length;
  const expected: Record<BlockName, number | null> = {
    idf: header.termCount * 8,
    intercepts: k * 8,
    weights: k * header.termCount * 4,
    terms: null,
  };
  for (const name of Object.keys(expected) as BlockName[]) {
    const block = header.blocks[name];
    const size = expected[name];
    if (!block || (size !== null && block.byteLength !== size) || bodyStart + block.offset + block.byteLength > bytes.byteLength) {
      throw new Error(`The model file is damaged: block "${name}" has the wrong size.`);
    }
  }
  return { header, bodyStart };
}

/** Loads a model saved by saveModel. */
export function loadModel(bytes: Uint8Array): FoldwrightModel {
  const { header, bodyStart } = readHeader(bytes);
  // slice() copies into a fresh, aligned buffer for the typed-array views.
  const block = (name: BlockName) =>
    bytes.slice(bodyStart + header.blocks[name].offset, bodyStart + header.blocks[name].offset + header.blocks[name].byteLength).buffer;
  const termsText = new TextDecoder().decode(new Uint8Array(block("terms")));
  const terms = header.termCount === 0 ? [] : termsText.split("\n");
  if (terms.length !== header.termCount) throw new Error("The model file is damaged: the term list has the wrong length.");
  const idf = new Float64Array(block("idf"));
  return {
    kind: MODEL_KIND,
    formatVersion: header.formatVersion,
    classes: header.classes,
    terms,
    vocabulary: { terms, idf, index: indexTerms(terms), ...(header.options.tfidf.headingWeight !== undefined ? { headingWeight: header.options.tfidf.headingWeight } : {}) },
    weights: new Float32Array(block("weights")),
    intercepts: new Float64Array(block("intercepts")),
    options: header.options,
    counts: header.counts,
    metrics: header.metrics,
    createdAt: header.createdAt,
  };
}
