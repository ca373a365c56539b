// PUT with a JSON body, answered like every other call of lib/api-client (an ApiError with the
// server's { error, message, details }). lib/api-client has no `put` yet; when it gains one,
// the callers here switch to api.put and this file goes.
import { ApiError } from '../../../lib/api-client';

export async function putJson<T>(url: string, body: unknown): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, {
      method: 'PUT',
      credentials: 'include',
      headers: { Accept: 'application/json', 'Content-Type': 'application/json' },
      body: JSON.stringify(body),
    });
  } catch {
    throw new ApiError(0, 'network', 'The server cannot be reached. Check the connection and try again.');
  }
  if (!res.ok) {
    type ErrorBody = { error?: unknown; message?: unknown; details?: unknown };
    const b: ErrorBody | null = await res.json().then(
      (x: unknown) => (x && typeof x === 'object' ? (x as ErrorBody) : null),
      () => null,
    );
    const fallback =
      res.status === 409 ? 'Someone else changed this in the meantime.' : `The server answered ${res.status} ${res.statusText}.`;
    throw new ApiError(
      res.status,
      typeof b?.error === 'string' ? b.error : `http_${res.status}`,
      typeof b?.message === 'string' && b.message ? b.message : fallback,
      b?.details,
    );
  }
  return (await res.json()) as T;
}
