// A JSON PUT with the same error shape as lib/api-client (which has no `put` yet): the session
// cookie sent, and a failure turned into an ApiError carrying { error, message, details }.
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
  const text = await res.text();
  const parsed: unknown = text ? JSON.parse(text) : undefined;
  if (!res.ok) {
    const b = (parsed && typeof parsed === 'object' ? parsed : {}) as { error?: unknown; message?: unknown; details?: unknown };
    throw new ApiError(
      res.status,
      typeof b.error === 'string' ? b.error : `http_${res.status}`,
      typeof b.message === 'string' && b.message ? b.message : `The server answered ${res.status} ${res.statusText}.`,
      b.details,
    );
  }
  return parsed as T;
}
