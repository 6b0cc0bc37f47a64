/** The server's single error shape, as an Error the screens can show field by field. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string> = {},
    readonly current?: unknown,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

type Listener = (error: ApiError) => void;
const unauthorizedListeners = new Set<Listener>();

/** Lets the router send the user to sign-in (with a return path) when a session ends. */
export function onUnauthorized(listener: Listener): () => void {
  unauthorizedListeners.add(listener);
  return () => unauthorizedListeners.delete(listener);
}

interface RequestOptions {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  body?: unknown;
  signal?: AbortSignal;
  /** Do not announce a 401 (e.g. the "who am I" probe on first load). */
  quiet401?: boolean;
}

/** Every call to the API goes through here: JSON in and out, the CSRF header, one error shape. */
export async function api<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const { method = 'GET', body, signal, quiet401 } = options;
  const headers: Record<string, string> = { Accept: 'application/json', 'X-Requested-With': 'XMLHttpRequest' };
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  let response: Response;
  try {
    response = await fetch(`/api${path}`, {
      method,
      headers,
      body: body === undefined ? undefined : JSON.stringify(body),
      credentials: 'same-origin',
      signal,
    });
  } catch (cause) {
    if ((cause as Error).name === 'AbortError') throw cause;
    throw new ApiError(0, 'network', 'Cannot reach the Knitwright server. Check the connection and try again.');
  }
  if (response.status === 204) return undefined as T;
  const text = await response.text();
  const data: unknown = text ? safeJson(text) : undefined;
  if (!response.ok) {
    const err = (data as { error?: { code?: string; message?: string; fields?: Record<string, string>; current?: unknown } })?.error;
    const error = new ApiError(
      response.status,
      err?.code ?? 'http_error',
      err?.message ?? `The server answered ${response.status}.`,
      err?.fields ?? {},
      err?.current,
    );
    if (response.status === 401 && !quiet401) unauthorizedListeners.forEach((l) => l(error));
    throw error;
  }
  return data as T;
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}
