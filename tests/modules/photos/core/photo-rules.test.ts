import fs from 'node:fs';
import path from 'node:path';

import { sniffImageType } from '@/modules/photos/core/photo-rules';

const fixture = (name: string) => fs.readFileSync(path.join(__dirname, '../../../fixtures', name));

describe('sniffImageType', () => {
  // ISO/IEC 10918-1 (JPEG SOI), ISO/IEC 15948 (PNG signature), RFC 9649 (WebP in RIFF)
  it.each([
    ['keys-photo.jpg', 'image/jpeg'],
    ['keys-photo.png', 'image/png'],
    ['keys-photo.webp', 'image/webp'],
  ])('reads %s as %s', (name, type) => expect(sniffImageType(fixture(name))).toBe(type));

  it.each([
    ['a PDF', Buffer.from('%PDF-1.7\n')],
    ['HTML', Buffer.from('<!doctype html><script>')],
    ['a RIFF that is not WebP (WAV)', Buffer.from('RIFF\x24\x00\x00\x00WAVEfmt ', 'latin1')],
    ['a truncated JPEG marker', Buffer.from([0xff, 0xd8])],
    ['nothing', Buffer.alloc(0)],
  ])('refuses %s', (_label, bytes) => expect(sniffImageType(bytes)).toBeNull());
});
