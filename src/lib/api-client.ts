// The one fetch wrapper of the client: JSON in and out, the session cookie always sent,
// and every failure turned into an ApiError carrying the server's { error, message, details }.

/** A failed API call. `code` is the server's stable error code ("stale_version", ...). */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details: unknown;

  constructor(status: number, code: string, message: string, details?: unknown) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.details = details;
  }

  /** Issues the server listed for a 400/422, as { path, message }. */
  get issues(): { path: string; message: string }[] {
    const d = this.details as { issues?: unknown } | undefined;
    return Array.isArray(d?.issues) ? (d.issues as { path: string; message: string }[]) : [];
  }
}

export function isApiError(error: unknown, status?: number): error is ApiError {
  return error instanceof ApiError && (status === undefined || error.status === status);
}

const FALLBACK_MESSAGES: Record<number, string> = {
  401: 'You are not signed in.',
  403: 'Your role on this farm does not allow that.',
  404: 'Not found, or you are not a member of this farm.',
  409: 'Someone else changed this in the meantime.',
  413: 'The file is too large.',
  415: 'This type of file is not supported.',
  429: 'Too many attempts. Wait a minute and try again.',
};

/** The ApiError for a failed response: the server's { error, message, details }, or words for its status. */
export async function toApiError(res: Response): Promise<ApiError> {
  type ErrorBody = { error?: unknown; message?: unknown; details?: unknown };
  const body: ErrorBody | null = await res.json().then(
    (b: unknown) => (b && typeof b === 'object' ? (b as ErrorBody) : null),
    () => null,
  );
  const code = typeof body?.error === 'string' ? body.error : `http_${res.status}`;
  const message =
    typeof body?.message === 'string' && body.message
      ? body.message
      : (FALLBACK_MESSAGES[res.status] ?? `The server answered ${res.status} ${res.statusText}.`);
  return new ApiError(res.status, code, message, body?.details);
}

type Body = unknown;

async function request<T>(method: string, url: string, body?: Body): Promise<T> {
  const init: RequestInit = { method, credentials: 'include', headers: { Accept: 'application/json' } };
  if (body instanceof FormData) {
    init.body = body;
  } else if (body !== undefined) {
    init.body = JSON.stringify(body);
    (init.headers as Record<string, string>)['Content-Type'] = 'application/json';
  }
  let res: Response;
  try {
    res = await fetch(url, init);
  } catch {
    throw new ApiError(0, 'network', 'The server cannot be reached. Check the connection and try again.');
  }
  if (!res.ok) throw await toApiError(res);
  if (res.status === 204) return undefined as T;
  const text = await res.text();
  return (text ? JSON.parse(text) : undefined) as T;
}

export const api = {
  get: <T>(url: string) => request<T>('GET', url),
  post: <T>(url: string, body?: Body) => request<T>('POST', url, body),
  patch: <T>(url: string, body?: Body) => request<T>('PATCH', url, body),
  put: <T>(url: string, body?: Body) => request<T>('PUT', url, body),
  delete: <T = void>(url: string) => request<T>('DELETE', url),
};
