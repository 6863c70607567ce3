// Client-side calls of the To review screen. Errors carry the server's sentence.
export class ApiError extends Error {}

export async function getJson<T>(url: string): Promise<T> {
  const res = await fetch(url);
  const body = await res.json().catch(() => null);
  if (!res.ok) throw new ApiError(body?.error?.message ?? `The server answered ${res.status}. Reload the page and try again.`);
  return body as T;
}

export async function postJson<T>(url: string, payload: unknown): Promise<T> {
  const res = await fetch(url, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(payload) });
  const body = await res.json().catch(() => null);
  if (!res.ok) throw new ApiError(body?.error?.message ?? `The server answered ${res.status}. Nothing was filed; try again.`);
  return body as T;
}

export interface FilingPayload {
  action: "accept" | "refile" | "file" | "confirm" | "move";
  cabinetTypeId?: number;
  matterId?: number;
}
