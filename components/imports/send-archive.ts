// Sends an archive to POST /api/imports with XMLHttpRequest (for upload progress): a zip as the
// field "file", or a dropped folder's files as "folderFile" fields, each after its "path".
export interface FolderFile {
  file: File;
  path: string; // relative, with "/" separators, starting with the dropped folder's name
}

export type Archive = { kind: "zip"; file: File } | { kind: "folder"; name: string; files: FolderFile[] };

export function archiveSize(a: Archive): number {
  return a.kind === "zip" ? a.file.size : a.files.reduce((s, f) => s + f.file.size, 0);
}

export function sendArchive(archive: Archive, onProgress: (fraction: number) => void): Promise<{ id: number } | { error: string }> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", "/api/imports");
    xhr.responseType = "json";
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
    xhr.onerror = () => resolve({ error: "The upload was cut off before Foldwright had the whole archive. Nothing was imported; check the connection and send it again." });
    xhr.onload = () => {
      const body = xhr.response as { id?: number; error?: { message: string } } | null;
      if (xhr.status === 202 && body?.id) resolve({ id: body.id });
      else resolve({ error: body?.error?.message ?? `The server answered ${xhr.status}. Nothing was imported; send the archive again, and tell your admin if it keeps failing.` });
    };
    const form = new FormData();
    if (archive.kind === "zip") form.append("file", archive.file, archive.file.name);
    else {
      form.append("source", archive.name);
      for (const f of archive.files) {
        form.append("path", f.path);
        form.append("folderFile", f.file, f.file.name);
      }
    }
    xhr.send(form);
  });
}

async function walkEntry(entry: FileSystemEntry, out: FolderFile[]): Promise<void> {
  if (entry.isFile) {
    const file = await new Promise<File>((ok, fail) => (entry as FileSystemFileEntry).file(ok, fail));
    out.push({ file, path: entry.fullPath.replace(/^\/+/, "") });
    return;
  }
  const reader = (entry as FileSystemDirectoryEntry).createReader();
  // readEntries answers in batches (100 in Chromium) until it answers an empty one.
  for (;;) {
    const batch = await new Promise<FileSystemEntry[]>((ok, fail) => reader.readEntries(ok, fail));
    if (batch.length === 0) break;
    for (const child of batch) await walkEntry(child, out);
  }
}

/** What a drop holds: one zip, or a folder (walked through the File and Directory Entries API). */
export async function archiveFromDrop(items: DataTransferItemList): Promise<Archive | { error: string }> {
  const entries = [...items].map((i) => i.webkitGetAsEntry()).filter((e): e is FileSystemEntry => e !== null);
  const only = entries.length === 1 ? entries[0] : null;
  if (only?.isFile && /\.zip$/i.test(only.name)) {
    const file = await new Promise<File>((ok, fail) => (only as FileSystemFileEntry).file(ok, fail));
    return { kind: "zip", file };
  }
  if (!only?.isDirectory) return { error: "Drop one zip, or the one folder that holds your cabinet-type folders." };
  const files: FolderFile[] = [];
  await walkEntry(only, files);
  return { kind: "folder", name: only.name, files };
}

/** The files of an <input webkitdirectory>, with their paths. */
export function archiveFromInput(list: FileList): Archive | { error: string } {
  const files = [...list].map((file) => ({ file, path: (file as File & { webkitRelativePath?: string }).webkitRelativePath || file.name }));
  if (files.length === 0) return { error: "That folder holds no files." };
  return { kind: "folder", name: files[0].path.split("/")[0] || "folder", files };
}
