// Every route handler and page under app/, as paths relative to app/ — what the role and wall
// matrices must each account for.
import fs from "node:fs";
import path from "node:path";

export const APP_DIR = path.resolve(__dirname, "../../app");

export function listRoutesAndPages(): string[] {
  const found: string[] = [];
  const walk = (dir: string) => {
    for (const e of fs.readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, e.name);
      if (e.isDirectory()) walk(full);
      else if (/^(route\.ts|page\.tsx)$/.test(e.name)) found.push(path.relative(APP_DIR, full));
    }
  };
  walk(APP_DIR);
  return found;
}

/** True for a route file that answers GET. */
export function servesGet(file: string): boolean {
  return /export const GET\b|export (async )?function GET\b/.test(fs.readFileSync(path.join(APP_DIR, file), "utf8"));
}

const WRITE_METHODS = ["POST", "PUT", "PATCH", "DELETE"] as const;

/** The write methods (POST/PUT/PATCH/DELETE) a route file exports. */
export function writeMethods(file: string): string[] {
  const source = fs.readFileSync(path.join(APP_DIR, file), "utf8");
  return WRITE_METHODS.filter((m) => new RegExp(`export const ${m}\\b|export (async )?function ${m}\\b|\\bas ${m}\\b`).test(source));
}

/** A request path for a route file: each dynamic segment filled with a value no row has. */
export function samplePath(file: string): string {
  const dir = path.dirname(file).split(path.sep).join("/");
  return "/" + dir.replace(/\[\.\.\.[^\]]+\]/g, "no-such-thing").replace(/\[[^\]]+\]/g, "999999");
}
