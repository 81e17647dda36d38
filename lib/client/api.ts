// Browser-side calls to Cordarium's JSON API: one error shape for every refusal.
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string[]> = {},
    readonly body: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

export async function api<T>(url: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
  const res = await fetch(url, {
    method: init.method ?? (init.body === undefined ? "GET" : "POST"),
    headers: init.body === undefined ? undefined : { "content-type": "application/json" },
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
  });
  const data = (await res.json().catch(() => ({}))) as { error?: { code: string; message: string; fields?: Record<string, string[]> } };
  if (!res.ok) {
    const e = data.error;
    throw new ApiError(res.status, e?.code ?? "http_error", e?.message ?? `The server answered ${res.status}.`, e?.fields, e as Record<string, unknown>);
  }
  return data as T;
}
