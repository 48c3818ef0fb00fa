import express, { type Response, type Router } from 'express';
import type passport from 'passport';

import type { User } from '@/modules/accounts/server/user-model';
import {
  acknowledge,
  checkCode,
  checkedVersionHtml,
  floorTag,
  publicDisclosure,
  publicDisclosureHtml,
  signedPdfByReceipt,
  signedPdfForStaff,
  type DisclosureDeps,
} from '@/modules/disclosure/server/disclosure-service';

import { catalogue, type CatalogueDeps } from '@/modules/catalogue/server/catalogue-service';
import { publicDepositTerms } from '@/modules/deposits/server/deposit-service';

import { requireAbility, requireUser } from './auth';
import { idParam, optionalIntQuery } from './params';
import { jsonBody, type Middleware } from './requests';

function sendPdf(res: Response, pdf: Buffer, filename: string, inline = false): void {
  res.type('application/pdf').setHeader('Content-Disposition', `${inline ? 'inline' : 'attachment'}; filename="${filename}"`);
  res.setHeader('Cache-Control', 'private, no-store');
  res.send(pdf);
}

/** What a buyer reaches without signing in: a disclosure by its unguessable link, and their own signed copy. */
export function publicRouter(deps: DisclosureDeps, writeLimit: Middleware): Router {
  const router = express.Router();
  router.use((_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    res.setHeader('X-Robots-Tag', 'noindex');
    next();
  });
  router.get('/disclosures/:token', async (req, res) => {
    const shown = await publicDisclosure(deps, req.params.token, optionalIntQuery(req.query.version, 'version'));
    const price = shown.content.askingPrice;
    res.json({ ...shown, depositTerms: price ? await publicDepositTerms(price) : null });
  });
  router.get('/disclosures/:token/html', async (req, res) => {
    res.type('html').send(await publicDisclosureHtml(req.params.token, optionalIntQuery(req.query.version, 'version')));
  });
  router.post('/disclosures/:token/acknowledge', writeLimit, jsonBody('4kb'), async (req, res) => {
    const answer = await acknowledge(req.params.token, req.body);
    // 200 with the first one when this buyer had acknowledged this version already.
    res.status(answer.already ? 200 : 201).json(answer);
  });
  // Anyone holding a paper checks its code; counted like the anonymous writes, so codes cannot be tried in bulk.
  router.get('/check/:code', writeLimit, async (req, res) => {
    res.json(await checkCode(req.params.code));
  });
  router.get('/check/:code/html', writeLimit, async (req, res) => {
    res.type('html').send(await checkedVersionHtml(req.params.code, idParam(req.query.id)));
  });
  router.get('/receipts/:token.pdf', async (req, res) => {
    const { pdf, filename } = await signedPdfByReceipt(deps, req.params.token);
    sendPdf(res, pdf, filename);
  });
  return router;
}

/** The public list of pianos on the floor: anyone may read it, a page at a time, within a limit per address. */
export function catalogueRouter(deps: CatalogueDeps, readLimit: Middleware): Router {
  const router = express.Router();
  router.get('/pianos', readLimit, async (req, res) => {
    // Holds and sales take a piano off at once: no copy of the list is kept anywhere.
    res.setHeader('Cache-Control', 'no-store');
    res.json(await catalogue(deps, req.query));
  });
  return router;
}

/** Documents for signed-in staff: floor tags and signed copies. */
export function documentsRouter(pp: passport.PassportStatic, deps: DisclosureDeps): Router {
  const router = express.Router();
  const staff = requireUser(pp, 'rest');
  const seller = requireAbility('showToBuyers', 'print floor tags and signed copies');
  router.get('/pianos/:id/floor-tag.pdf', staff, seller, async (req, res) => {
    const id = idParam(req.params.id);
    const pdf = await floorTag(deps, req.user as User, id);
    sendPdf(res, pdf, `floor-tag-${id}.pdf`, true);
  });
  router.get('/acknowledgements/:id/signed.pdf', staff, seller, async (req, res) => {
    const { pdf, filename } = await signedPdfForStaff(deps, req.user as User, idParam(req.params.id));
    sendPdf(res, pdf, filename);
  });
  return router;
}
