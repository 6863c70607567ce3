/** Fetches JSON; a failed answer throws its `{"error": {"message"}}` sentence so the screen can show it. */
export async function requestJson<T>(url: string, init?: RequestInit): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, { ...init, headers: { "content-type": "application/json", ...init?.headers } });
  } catch {
    throw new Error("Foldwright could not be reached. Check the connection and try again.");
  }
  const body = (await res.json().catch(() => null)) as { error?: { message?: string } } | null;
  if (!res.ok) throw new Error(body?.error?.message ?? `The server answered ${res.status}. Try again; if it keeps failing, tell your admin.`);
  return body as T;
}
