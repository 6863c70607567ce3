import "server-only";
// Page previews of an original, behind the same check as the original itself (the wall: 404;
// a destroyed original: 410), rendered once and kept in the bucket under previews/{id}/.
// Disposal deletes that folder with the original (lib/data/disposal-decide.ts).
import { AppError } from "@/lib/errors";
import { findOriginal } from "@/lib/data/documents";
import type { CurrentUser } from "@/lib/data/users";
import { PreviewError, renderPreviewPage, type PreviewPage } from "@/lib/preview/render-page";
import { deleteObjectsUnder, getObjectBytes, headObject, isMissingObject, isStorageUnavailable, putObject } from "@/storage/s3";

/** Bumped when the renderer changes, so old cached pages are not served again. */
const RENDER_VERSION = "v1";
const PAGE_COUNT_META = "page-count";

export const previewPrefix = (documentId: number) => `previews/${documentId}/`;
const previewKey = (documentId: number, page: number) => `${previewPrefix(documentId)}${RENDER_VERSION}/p${page}.png`;

function storeError(e: unknown, id: number): AppError {
  console.error(`preview of document ${id}: the store answered`, e);
  if (isMissingObject(e)) return new AppError(404, "original_missing", "The original of this document is not in the document store. Tell your admin: it may need restoring from a backup.");
  if (isStorageUnavailable(e)) return new AppError(503, "storage_unavailable", "The document store is not answering, so the page cannot be shown now. Try again in a minute.");
  return new AppError(500, "storage_refused", "The document store refused to send this original. Tell your admin (the server log has the store's answer).");
}

export async function getPreviewPage(user: CurrentUser, documentId: number, page: number): Promise<PreviewPage & { cached: boolean }> {
  const original = await findOriginal(user, documentId); // the wall and the tombstone, before anything is read
  const key = previewKey(documentId, page);
  try {
    const head = await headObject(key);
    if (head) return { png: await getObjectBytes(key), pageCount: Number(head.metadata[PAGE_COUNT_META]) || 1, cached: true };
  } catch (e) {
    throw storeError(e, documentId);
  }
  let bytes: Buffer;
  try {
    bytes = await getObjectBytes(original.key);
  } catch (e) {
    throw storeError(e, documentId);
  }
  let rendered: PreviewPage;
  try {
    rendered = await renderPreviewPage(bytes, original.mediaType, page);
  } catch (e) {
    if (!(e instanceof PreviewError)) throw e;
    if (e.code === "no_such_page") throw new AppError(404, "no_such_page", e.message);
    throw new AppError(e.code === "unsupported" ? 415 : 422, `preview_${e.code}`, e.message);
  }
  // A cache that cannot be written is no reason to withhold the page.
  await putObject(key, rendered.png, { contentType: "image/png", metadata: { [PAGE_COUNT_META]: String(rendered.pageCount) } }).catch((e) => console.error(`preview of document ${documentId}: not cached`, e));
  return { ...rendered, cached: false };
}

/** Removes every cached page of a document (with its original, at disposal). */
export async function deletePreviews(documentId: number): Promise<void> {
  await deleteObjectsUnder(previewPrefix(documentId));
}
