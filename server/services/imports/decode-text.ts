// Bytes → text for JSON and XML uploads: honours a UTF-8/UTF-16 byte-order mark and, for XML,
// the encoding named in the <?xml ... encoding="..."?> declaration. Pure, in memory.

/** Decodes with `label`, or returns null when the runtime does not know that encoding. */
function decodeAs(bytes: Uint8Array, label: string): string | null {
  try {
    return new TextDecoder(label).decode(bytes);
  } catch {
    return null;
  }
}

/** Text of an upload; the byte-order mark, if any, is removed. */
export function decodeText(bytes: Uint8Array): string {
  if (bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) return decodeAs(bytes.subarray(3), 'utf-8')!;
  if (bytes[0] === 0xff && bytes[1] === 0xfe) return decodeAs(bytes.subarray(2), 'utf-16le')!;
  if (bytes[0] === 0xfe && bytes[1] === 0xff) return decodeAs(bytes.subarray(2), 'utf-16be')!;
  const utf8 = decodeAs(bytes, 'utf-8')!;
  const declared = /^\s*<\?xml[^>]*\bencoding\s*=\s*["']([A-Za-z0-9._-]+)["']/.exec(utf8)?.[1]?.toLowerCase();
  if (declared && declared !== 'utf-8' && declared !== 'utf8') return decodeAs(bytes, declared) ?? utf8;
  return utf8;
}

/** True when the bytes look like binary data rather than text (a NUL in the first 4 KiB). */
export function looksBinary(bytes: Uint8Array): boolean {
  const head = bytes.subarray(0, 4096);
  const utf16 = (head[0] === 0xff && head[1] === 0xfe) || (head[0] === 0xfe && head[1] === 0xff);
  return !utf16 && head.includes(0);
}
