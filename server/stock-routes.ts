import express, { type Router } from 'express';
import type passport from 'passport';

import type { User } from '@/modules/accounts/server/user-model';
import { stockCsv } from '@/modules/pricing/core/stock-table';
import type { PricingDeps } from '@/modules/pricing/server/pricing-service';
import { stockExport } from '@/modules/pricing/server/stock-service';

import { requireUser } from './auth';
import { badInput } from './errors';

const LISTS = ['stages', 'kinds', 'readiness'] as const;
const KNOWN = new Set<string>([...LISTS, 'search', 'sort', 'descending']);

/** The stock table's filter and sort as the screen puts them in the address: lists comma-separated. */
export function stockQueryFromUrl(query: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(query)) {
    if (!KNOWN.has(key)) throw badInput(key, `is not a filter of the stock table (${[...KNOWN].join(', ')})`);
    if (typeof value !== 'string') throw badInput(key, 'must be given once, as text');
    if ((LISTS as readonly string[]).includes(key)) out[key] = value === '' ? null : value.split(',');
    else if (key === 'descending') {
      if (value !== 'true' && value !== 'false') throw badInput(key, 'must be true or false');
      out[key] = value === 'true';
    } else out[key] = value === '' ? null : value;
  }
  return out;
}

/** The manager's stock table as CSV: the filtered rows in the table's order. */
export function stockRouter(pp: passport.PassportStatic, deps: PricingDeps): Router {
  const router = express.Router();
  router.get('/stock/export.csv', requireUser(pp, 'rest'), async (req, res) => {
    const page = await stockExport(deps, req.user as User, stockQueryFromUrl(req.query as Record<string, unknown>));
    const day = deps.clock.now().toISOString().slice(0, 10);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="stock-${day}.csv"`);
    res.setHeader('Cache-Control', 'no-store');
    res.setHeader('X-Rows', String(page.rows.length));
    res.setHeader('X-Total', String(page.total));
    res.send(stockCsv(page.rows));
  });
  return router;
}
