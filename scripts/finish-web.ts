// After the export: puts the buyer's bundle beside the staff app's, under a name that changes with its
// content, writes dist/buyer.html, the page the server sends for /d/... (same head as index.html), and
// a brotli and a gzip copy of every script.
// `tsx scripts/finish-web.ts <buyer bundle> <its assets folder>`
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';

const [bundle, assets] = process.argv.slice(2);
const dist = path.resolve(__dirname, '../dist');
const code = fs.readFileSync(bundle);
const name = `buyer-${createHash('md5').update(code).digest('hex')}.js`;
fs.writeFileSync(path.join(dist, '_expo/static/js/web', name), code);
// The assets are the staff app's too, under the same hashed names; copy any the export did not write.
fs.cpSync(assets, dist, { recursive: true, force: false });
const index = fs.readFileSync(path.join(dist, 'index.html'), 'utf8');
const scripts = /(<script src="\/_expo\/static\/js\/web\/[^"]+" defer><\/script>)+/;
if (!scripts.test(index)) throw new Error('dist/index.html has no script tags where the export puts them');
fs.writeFileSync(path.join(dist, 'buyer.html'), index.replace(scripts, `<script src="/_expo/static/js/web/${name}" defer></script>`));
console.log(`buyer bundle: ${name} (${Math.round(code.length / 1024)} KB)`);

// Each script compressed once here, at the strongest settings, instead of on every download.
const scriptsDir = path.join(dist, '_expo/static/js/web');
for (const file of fs.readdirSync(scriptsDir).filter((f) => f.endsWith('.js'))) {
  const body = fs.readFileSync(path.join(scriptsDir, file));
  fs.writeFileSync(path.join(scriptsDir, `${file}.br`), zlib.brotliCompressSync(body, { params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 11, [zlib.constants.BROTLI_PARAM_SIZE_HINT]: body.length } }));
  fs.writeFileSync(path.join(scriptsDir, `${file}.gz`), zlib.gzipSync(body, { level: 9 }));
}
