// Password rules for a chosen password (invitation, reset). After NIST SP 800-63B §5.1.1.2: a
// minimum length, no composition rules, and a check against passwords known to be common. Our
// minimum is 10, above NIST's 8 (common practice for accounts that hold clients' confidential
// files). bcrypt reads only the first 72 bytes, so longer passwords are refused rather than
// silently cut.
import fs from "node:fs";
import path from "node:path";
import { env } from "@/lib/env";

export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_BYTES = 72;

export const PASSWORD_RULES = `Use at least ${PASSWORD_MIN_LENGTH} characters (a few words make a good one), not your e-mail address, and not a commonly used password.`;

let common: Set<string> | null = null;

/** The shipped list (lib/auth/common-passwords.txt; its source is named in its header). */
export function commonPasswords(): Set<string> {
  common ??= new Set(
    fs
      .readFileSync(path.join(env.root, "lib/auth/common-passwords.txt"), "utf8")
      .split("\n")
      .filter((line) => line && !line.startsWith("#")),
  );
  return common;
}

/** A sentence saying what to change, or null when the password may be used. */
export function checkPassword(password: string, email: string): string | null {
  if ([...password].length < PASSWORD_MIN_LENGTH) return `This password is too short. ${PASSWORD_RULES}`;
  if (Buffer.byteLength(password, "utf8") > PASSWORD_MAX_BYTES) return `This password is longer than ${PASSWORD_MAX_BYTES} bytes, the most Foldwright can check. Choose a shorter one.`;
  const lower = password.toLowerCase();
  const address = email.trim().toLowerCase();
  const local = address.split("@")[0] ?? "";
  if (lower === address || (local.length >= 4 && lower.includes(local))) return `This password contains your e-mail address. ${PASSWORD_RULES}`;
  if (commonPasswords().has(lower)) return `This password is on a list of commonly used passwords, so it is easy to guess. ${PASSWORD_RULES}`;
  return null;
}
