// What a photo upload may be: its area, its size, and its real type read from its first bytes.
export const PHOTO_AREAS = ['keys', 'hammers', 'strings', 'soundboard', 'tuning', 'play', 'case', 'general'] as const;
export type PhotoArea = (typeof PHOTO_AREAS)[number];

export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;

export type ImageType = 'image/jpeg' | 'image/png' | 'image/webp';
export const IMAGE_EXTENSIONS: Record<ImageType, string> = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' };

const startsWith = (bytes: Uint8Array, sig: number[], at = 0) => sig.every((b, i) => bytes[at + i] === b);

/** The image type the bytes really hold (JPEG, PNG or WebP signatures), or null. */
export function sniffImageType(bytes: Uint8Array): ImageType | null {
  // JPEG: SOI marker FF D8 then another marker FF (ISO/IEC 10918-1)
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return 'image/jpeg';
  // PNG: the eight-byte signature 89 50 4E 47 0D 0A 1A 0A (ISO/IEC 15948)
  if (startsWith(bytes, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return 'image/png';
  // WebP: a RIFF container whose form type is WEBP (RFC 9649)
  if (startsWith(bytes, [0x52, 0x49, 0x46, 0x46]) && startsWith(bytes, [0x57, 0x45, 0x42, 0x50], 8)) return 'image/webp';
  return null;
}
