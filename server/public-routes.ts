import express, { type Response, type Router } from 'express';
import type passport from 'passport';

import type { User } from '@/modules/accounts/server/user-model';
import {
  acknowledge,
  floorTag,
  publicDisclosure,
  publicDisclosureHtml,
  signedPdfByReceipt,
  signedPdfForStaff,
  type DisclosureDeps,
} from '@/modules/disclosure/server/disclosure-service';

import { publicDepositTerms } from '@/modules/deposits/server/deposit-service';

import { requireUser } from './auth';

function version(raw: unknown): number | undefined {
  if (raw == null) return undefined;
  const n = Number(raw);
  return Number.isInteger(n) && n > 0 ? n : -1;
}

function sendPdf(res: Response, pdf: Buffer, filename: string, inline = false): void {
  res.type('application/pdf').setHeader('Content-Disposition', `${inline ? 'inline' : 'attachment'}; filename="${filename}"`);
  res.setHeader('Cache-Control', 'private, no-store');
  res.send(pdf);
}

/** What a buyer reaches without signing in: a disclosure by its unguessable link, and their own signed copy. */
export function publicRouter(deps: DisclosureDeps): Router {
  const router = express.Router();
  router.use((_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    res.setHeader('X-Robots-Tag', 'noindex');
    next();
  });
  router.get('/disclosures/:token', async (req, res) => {
    const shown = await publicDisclosure(deps, req.params.token, version(req.query.version));
    const price = shown.content.askingPrice;
    res.json({ ...shown, depositTerms: price ? await publicDepositTerms(price) : null });
  });
  router.get('/disclosures/:token/html', async (req, res) => {
    res.type('html').send(await publicDisclosureHtml(req.params.token, version(req.query.version)));
  });
  router.post('/disclosures/:token/acknowledge', express.json({ limit: '4kb' }), async (req, res) => {
    res.status(201).json(await acknowledge(req.params.token, req.body));
  });
  router.get('/receipts/:token.pdf', async (req, res) => {
    const { pdf, filename } = await signedPdfByReceipt(deps, req.params.token);
    sendPdf(res, pdf, filename);
  });
  return router;
}

/** Documents for signed-in staff: floor tags and signed copies. */
export function documentsRouter(pp: passport.PassportStatic, deps: DisclosureDeps): Router {
  const router = express.Router();
  router.use(requireUser(pp, 'rest'));
  router.get('/pianos/:id/floor-tag.pdf', async (req, res) => {
    const pdf = await floorTag(deps, req.user as User, Number(req.params.id));
    sendPdf(res, pdf, `floor-tag-${req.params.id}.pdf`, true);
  });
  router.get('/acknowledgements/:id/signed.pdf', async (req, res) => {
    const { pdf, filename } = await signedPdfForStaff(deps, req.user as User, Number(req.params.id));
    sendPdf(res, pdf, filename);
  });
  return router;
}
