import express from 'express';
import fs from 'node:fs';
import path from 'node:path';

// The exported web app. File names under these carry a hash of their content: a browser keeps them for
// a year and never asks again. The pages themselves (index.html, buyer.html) are asked for each time.
const HASHED = /^\/(_expo\/static|assets)\//;
const FOR_A_YEAR = 'public, max-age=31536000, immutable';
// The buyer's pages (a disclosure, its deposit, the check of a paper's code, the catalogue) have a bundle
// of their own (scripts/build-web.sh): a phone reading a disclosure downloads no staff screens.
const BUYER_PAGES = /^\/(d\/[^/]+(\/deposit)?|check(\/[^/]+)?|pianos-for-sale)\/?$/;

/** Serves dist/: hashed files compressed ahead of time when the browser takes that, every other page path the app's page. */
export function mountWeb(app: express.Express, dir: string, apiPrefixes: string[]): void {
  const webDir = path.resolve(dir);
  app.use((req, res, next) => {
    if ((req.method !== 'GET' && req.method !== 'HEAD') || !HASHED.test(req.path)) return next();
    const encoding = req.acceptsEncodings('br', 'gzip');
    const suffix = encoding === 'br' ? '.br' : encoding === 'gzip' ? '.gz' : null;
    const file = path.join(webDir, req.path);
    if (!suffix || !file.startsWith(webDir + path.sep) || !fs.existsSync(file + suffix)) return next();
    res.setHeader('Vary', 'Accept-Encoding');
    res.setHeader('Content-Encoding', encoding as string);
    res.setHeader('Cache-Control', FOR_A_YEAR);
    res.type(path.extname(file));
    res.sendFile(req.path + suffix, { root: webDir, dotfiles: 'deny', cacheControl: false }, (err) => err && next(err));
  });
  app.use(
    express.static(webDir, {
      index: false,
      cacheControl: false,
      setHeaders: (res, file) => res.setHeader('Cache-Control', HASHED.test(`/${path.relative(webDir, file)}`) ? FOR_A_YEAR : 'public, max-age=3600'),
    }),
  );
  app.get('/{*splat}', (req, res, next) => {
    if (apiPrefixes.some((p) => req.path === p || req.path.startsWith(`${p}/`))) return next();
    const buyer = path.join(webDir, 'buyer.html');
    const page = BUYER_PAGES.test(req.path) && fs.existsSync(buyer) ? buyer : path.join(webDir, 'index.html');
    if (!fs.existsSync(page)) {
      res.status(503).type('text').send('The web app is not built yet: run npm start.');
      return;
    }
    res.setHeader('Cache-Control', 'no-cache');
    // Relative to the folder: a checkout under a dot-folder still serves its pages.
    res.sendFile(path.basename(page), { root: webDir });
  });
}
