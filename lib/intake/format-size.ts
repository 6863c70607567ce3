const MB = 1024 * 1024;

/** "63.2 MB", "50 MB", "812 KB": sizes as a clerk reads them in a message. */
export function formatSize(bytes: number): string {
  if (bytes < MB) return `${Math.max(1, Math.round(bytes / 1024))} KB`;
  const megabytes = bytes / MB;
  const rounded = megabytes >= 100 ? Math.round(megabytes) : Math.round(megabytes * 10) / 10;
  return `${rounded.toLocaleString("en-US")} MB`;
}
