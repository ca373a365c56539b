// The kind of an uploaded image, told from its first bytes (never from its name or the
// browser's declared type): JPEG, PNG or WebP.

export type ImageType = { mime: 'image/jpeg' | 'image/png' | 'image/webp'; ext: '.jpg' | '.png' | '.webp' };

const startsWith = (b: Uint8Array, sig: number[], at = 0) => sig.every((x, i) => b[at + i] === x);

export function detectImageType(bytes: Uint8Array): ImageType | null {
  // JPEG: SOI marker FF D8 then the next marker's FF
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return { mime: 'image/jpeg', ext: '.jpg' };
  // PNG: the 8-byte signature
  if (startsWith(bytes, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return { mime: 'image/png', ext: '.png' };
  // WebP: "RIFF" <size> "WEBP"
  if (startsWith(bytes, [0x52, 0x49, 0x46, 0x46]) && startsWith(bytes, [0x57, 0x45, 0x42, 0x50], 8)) return { mime: 'image/webp', ext: '.webp' };
  return null;
}
