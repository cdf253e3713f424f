/** Browser-side JSON helpers for route handlers that answer `{ error, fieldErrors }` on failure. */
export type Result<T> = { ok: true; data: T } | { ok: false; status: number; error: string; fieldErrors?: Record<string, string[]> };

export async function postJson<T>(url: string, body: unknown, method = "POST"): Promise<Result<T>> {
  try {
    const res = await fetch(url, { method, headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
    const data = await res.json().catch(() => ({}));
    if (!res.ok) return { ok: false, status: res.status, error: data.error ?? `Request failed (${res.status})`, fieldErrors: data.fieldErrors };
    return { ok: true, data: data as T };
  } catch {
    return { ok: false, status: 0, error: "No connection. Check the network and try again; nothing was lost." };
  }
}

/** SWR fetcher: throws an Error carrying the server's message and status. */
export async function getJson<T>(url: string): Promise<T> {
  const res = await fetch(url);
  const data = await res.json().catch(() => ({}));
  if (!res.ok) {
    const err = new Error(data.error ?? `Request failed (${res.status})`) as Error & { status?: number };
    err.status = res.status;
    throw err;
  }
  return data as T;
}
