// An uploaded zip, opened in memory with jszip. Entry names are only compared, never used as
// paths; the total unzipped size is capped so a small zip cannot unpack into gigabytes.
import JSZip from 'jszip';
import { failure, type ImportFailure } from './import-types';
import { BOUNDARY_IMPORT_MAX_UNZIPPED_BYTES, BYTES_PER_MIB } from '../../../shared/limits';

/** Most bytes all entries read from one upload may unpack to. */

export type ZipEntry = { name: string; file: JSZip.JSZipObject };
export type OpenedZip = { ok: true; entries: ZipEntry[]; read: (entry: ZipEntry) => Promise<Uint8Array | ImportFailure> };

const isJunk = (name: string) => name.startsWith('__MACOSX/') || (name.split('/').pop() ?? '').startsWith('._');

/** Opens the archive; damaged or encrypted zips are a 400. */
export async function openZip(bytes: Uint8Array): Promise<OpenedZip | ImportFailure> {
  let zip: JSZip;
  try {
    zip = await JSZip.loadAsync(bytes);
  } catch (e) {
    return failure(400, 'invalid_zip', `The zip file is damaged or incomplete (${(e as Error).message}). Make the zip again and upload it.`);
  }
  const entries = Object.values(zip.files)
    .filter((f) => !f.dir && !isJunk(f.name))
    .map((file) => ({ name: file.name, file }));
  let budget = BOUNDARY_IMPORT_MAX_UNZIPPED_BYTES;
  const read = (entry: ZipEntry) =>
    new Promise<Uint8Array | ImportFailure>((resolve) => {
      const chunks: Buffer[] = [];
      const stream = entry.file.nodeStream('nodebuffer');
      stream.on('data', (chunk: Buffer) => {
        budget -= chunk.length;
        if (budget < 0) {
          (stream as unknown as { destroy?: () => void; pause: () => void }).pause();
          resolve(failure(413, 'unzipped_too_large',
            `The zip unpacks to more than ${BOUNDARY_IMPORT_MAX_UNZIPPED_BYTES / BYTES_PER_MIB} MB; upload only the layers with field boundaries.`));
          return;
        }
        chunks.push(chunk);
      });
      stream.on('error', (e: Error) =>
        resolve(failure(400, 'invalid_zip', `The zip entry "${entry.name}" could not be unpacked (${e.message}).`)));
      stream.on('end', () => resolve(new Uint8Array(Buffer.concat(chunks))));
    });
  return { ok: true, entries, read };
}
