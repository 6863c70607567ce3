import "server-only";
// The one place where an e-mailed attachment enters Intake: exactly the function behind
// POST /api/documents, so sniffing, limits, the duplicate check and the bad-input answers are
// the same. If storeUpload's signature changes (streaming uploads), only this adapter changes.
import { storeUpload, type UploadResult } from "@/lib/data/intake";
import type { CurrentUser } from "@/lib/data/users";

export function fileEmailAttachment(uploader: CurrentUser, name: string, bytes: Uint8Array): Promise<UploadResult> {
  return storeUpload(uploader, name, bytes);
}
