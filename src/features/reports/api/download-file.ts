// Downloads a file the server makes (a report, an export) with the session cookie, telling the
// caller how far it has got: first while the server makes it (no bytes yet), then the share of
// the bytes received. Failures are ApiErrors with the server's message.
import { ApiError, toApiError } from '../../../lib/api-client';

export type DownloadProgress = { phase: 'making' } | { phase: 'receiving'; fraction: number | null };
export type DownloadedFile = { blob: Blob; fileName: string };

/** The file name the server gave (Content-Disposition), or the last part of the URL. */
function fileNameOf(res: Response, url: string): string {
  const m = /filename="([^"]+)"/.exec(res.headers.get('Content-Disposition') ?? '');
  return m?.[1] ?? url.split('?')[0].split('/').pop() ?? 'download';
}

export async function downloadFile(url: string, onProgress: (p: DownloadProgress) => void): Promise<DownloadedFile> {
  onProgress({ phase: 'making' });
  let res: Response;
  try {
    res = await fetch(url, { credentials: 'include' });
  } catch {
    throw new ApiError(0, 'network', 'The server cannot be reached. Check the connection and try again.');
  }
  if (!res.ok) throw await toApiError(res);
  const total = Number(res.headers.get('Content-Length')) || null;
  const type = res.headers.get('Content-Type') ?? 'application/octet-stream';
  if (!res.body) return { blob: new Blob([await res.arrayBuffer()], { type }), fileName: fileNameOf(res, url) };
  const reader = res.body.getReader();
  const chunks: Uint8Array<ArrayBuffer>[] = [];
  let received = 0;
  onProgress({ phase: 'receiving', fraction: total ? 0 : null });
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    chunks.push(value as Uint8Array<ArrayBuffer>);
    received += value.byteLength;
    onProgress({ phase: 'receiving', fraction: total ? Math.min(1, received / total) : null });
  }
  return { blob: new Blob(chunks, { type }), fileName: fileNameOf(res, url) };
}
