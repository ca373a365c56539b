// Hands a made file to the browser as a download with its own name.
import type { Response } from 'express';

export type DownloadFile = { body: Buffer; contentType: string; fileName: string };

export function sendDownload(res: Response, file: DownloadFile): void {
  // The names are made by the server from the farm's name in ASCII words, so no quoting trouble.
  res.set({
    'Content-Type': file.contentType,
    'Content-Disposition': `attachment; filename="${file.fileName}"`,
    'Content-Length': String(file.body.length),
    'Cache-Control': 'private, no-store',
  });
  res.end(file.body);
}
