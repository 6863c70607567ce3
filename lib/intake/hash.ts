import { createHash } from "node:crypto";

/** Lower-case hex SHA-256 of the original bytes, used to spot an exact duplicate upload. */
export function sha256Hex(bytes: Uint8Array): string {
  return createHash("sha256").update(bytes).digest("hex");
}
