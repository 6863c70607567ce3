// The shape of an office's archive: top-level folders are cabinet types, a second level may be
// matter numbers. Pure: works on the paths a zip's directory or a dropped folder lists.

export interface ArchiveFile {
  /** Path inside the archive with "/" separators, as listed. */
  path: string;
  size: number;
}

export interface PlacedFile extends ArchiveFile {
  /** The path after the common root folder (a zipped folder usually has one). */
  relative: string;
  typeFolder: string | null; // null: the file sits at the top level, outside any folder
  matterFolder: string | null; // null: directly in the type folder
}

export interface FolderCount {
  name: string;
  files: number;
  bytes: number;
  /** Second-level folders with their counts (files directly in the type folder are `loose`). */
  matters: { name: string; files: number }[];
  loose: number;
}

// Operating systems' bookkeeping files, never an office's documents.
const SYSTEM_NAME = /^(\.DS_Store|Thumbs\.db|desktop\.ini|\._.*|~\$.*)$/i;
const SYSTEM_FOLDER = /^(__MACOSX|\.[^/]*)$/;

/** True for entries that are folders, or an operating system's files (skipped, not reported). */
export function isSystemEntry(path: string): boolean {
  if (path.endsWith("/")) return true;
  const parts = path.split("/");
  if (parts.slice(0, -1).some((p) => SYSTEM_FOLDER.test(p))) return true;
  return SYSTEM_NAME.test(parts[parts.length - 1] ?? "");
}

export function normalisePath(path: string): string {
  return path.replace(/\\/g, "/").replace(/^\/+/, "").split("/").filter((p) => p !== "" && p !== ".").join("/");
}

/**
 * Strips the one folder every file shares (zipping "Archive/" gives "Archive/Invoices/…"), as
 * long as folders remain beneath it; then the first folder is the cabinet type and the
 * second, when there is one, the matter.
 */
export function placeFiles(files: ArchiveFile[]): PlacedFile[] {
  const paths = files.map((f) => normalisePath(f.path).split("/"));
  let strip = 0;
  for (;;) {
    const first = paths[0]?.[strip];
    const shared = paths.length > 0 && paths.every((p) => p.length > strip + 1 && p[strip] === first);
    // Strip it only when folders remain beneath it (else the shared folder is itself the cabinet type).
    if (!shared || !paths.some((p) => p.length > strip + 2)) break;
    strip += 1;
  }
  return files.map((f, i) => {
    const parts = paths[i].slice(strip);
    const folders = parts.slice(0, -1);
    return {
      ...f,
      relative: parts.join("/"),
      typeFolder: folders[0] ?? null,
      matterFolder: folders[1] ?? null,
    };
  });
}

/** The folders found, with their counts, in the order a person reads them. */
export function countFolders(placed: PlacedFile[]): FolderCount[] {
  const byName = new Map<string, FolderCount>();
  for (const f of placed) {
    if (!f.typeFolder) continue;
    const folder = byName.get(f.typeFolder) ?? { name: f.typeFolder, files: 0, bytes: 0, matters: [], loose: 0 };
    folder.files += 1;
    folder.bytes += f.size;
    if (f.matterFolder) {
      const m = folder.matters.find((x) => x.name === f.matterFolder);
      if (m) m.files += 1;
      else folder.matters.push({ name: f.matterFolder, files: 1 });
    } else folder.loose += 1;
    byName.set(f.typeFolder, folder);
  }
  const sorted = [...byName.values()].sort((a, b) => a.name.localeCompare(b.name));
  for (const f of sorted) f.matters.sort((a, b) => a.name.localeCompare(b.name));
  return sorted;
}
