// Subsets the app's fonts (the TTFs shipped in their npm packages) to the characters Feltwire shows,
// as WOFF2, before the web export; Metro takes these in place of the TTFs (metro.config.js).
// `tsx scripts/build-fonts.ts`: writes build/web-fonts/<name>.woff2 when missing or stale.
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

import subsetFont from 'subset-font';

import { FONT_FILES, SUBSET_RANGES, subsetFontPath } from './metro/web-fonts';

// Every character of the ranges, as text: what the subset keeps.
const TEXT = SUBSET_RANGES.flatMap(([from, to]) => Array.from({ length: to - from + 1 }, (_, i) => String.fromCodePoint(from + i))).join('');

async function main(): Promise<void> {
  const root = path.resolve(__dirname, '..');
  for (const file of FONT_FILES) {
    const source = fs.readFileSync(require.resolve(file, { paths: [root] }));
    const out = subsetFontPath(root, file);
    const stamp = `${out}.source`;
    const digest = createHash('sha1').update(source).update(TEXT).digest('hex');
    if (fs.existsSync(out) && fs.existsSync(stamp) && fs.readFileSync(stamp, 'utf8') === digest) continue;
    fs.mkdirSync(path.dirname(out), { recursive: true });
    const woff2 = await subsetFont(source, TEXT, { targetFormat: 'woff2' });
    fs.writeFileSync(out, woff2);
    fs.writeFileSync(stamp, digest);
    console.log(`[fonts] ${path.basename(file)}: ${Math.round(source.length / 1024)} KB TTF -> ${Math.round(woff2.length / 1024)} KB WOFF2`);
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
