/** Browser-side JSON calls to Ketbook's API; failures become ApiClientError with the server's code and field messages. */

export class ApiClientError extends Error {
  readonly code: string;
  readonly status: number;
  readonly fields: Record<string, string[]>;
  constructor(status: number, code: string, message: string, fields: Record<string, string[]> = {}) {
    super(message);
    this.name = 'ApiClientError';
    this.status = status;
    this.code = code;
    this.fields = fields;
  }
}

export async function apiFetch<T>(path: string, { method = 'GET', body }: { method?: string; body?: unknown } = {}): Promise<T> {
  const response = await fetch(path, {
    method,
    headers: body === undefined ? undefined : { 'content-type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
    credentials: 'same-origin',
  });
  const data = (await response.json().catch(() => null)) as
    | { error?: { code: string; message: string; fields?: Record<string, string[]> } }
    | null;
  if (!response.ok) {
    const e = data?.error;
    throw new ApiClientError(
      response.status,
      e?.code ?? 'unknown',
      e?.message ?? `The server answered ${response.status}.`,
      e?.fields ?? {},
    );
  }
  return data as T;
}
