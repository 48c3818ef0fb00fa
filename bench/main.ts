// `npm run bench`: the main screens' queries, bundles, PDFs, the token check and the server's start,
// at 100 pianos and at a real dealer's 10,000 (BENCH_SCALE), on its own database and ports.
import { spawn, type ChildProcess } from 'node:child_process';
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { performance } from 'node:perf_hooks';
import zlib from 'node:zlib';

import autocannon from 'autocannon';
import knexFactory, { type Knex } from 'knex';
import { chromium } from 'playwright-core';

import { DEMO_PASSWORD } from '@/seeds/demo';
import { hashPassword } from '@/modules/accounts/server/user-service';
import { bindModels, createKnex, migrateLatest } from '@/server/db/knex';

import { seedBench, type BenchCounts } from './seed';
import { BENCH_JWT_SECRET } from './server';
import { screenRequests, type ScreenRequest, type Targets } from './screens';
import { measurePdfs, measureTokenCheck } from './in-process';
import { median, percentile, round } from './numbers';

const ROOT = path.resolve(__dirname, '..');
const PG = process.env.BENCH_PG_URL ?? 'postgres://postgres@127.0.0.1:55502';
const LARGE = Number(process.env.BENCH_SCALE ?? 10_000);
const SMALL = 100;
const PORT = Number(process.env.BENCH_PORT ?? 8148);
const START_PORT = Number(process.env.BENCH_START_PORT ?? 8149);
const S3 = process.env.BENCH_S3_ENDPOINT ?? 'http://127.0.0.1:4650';
const MAIL_PORT = Number(process.env.BENCH_MAIL_PORT ?? 2606);
const SECONDS = Number(process.env.BENCH_SECONDS ?? 3);
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 5);
// Screens are timed one request at a time (how quick a screen is for one person); the GraphQL against
// plain comparison loads with several at once (how much the server can do).
const CONNECTIONS = 1;
const LOAD_CONNECTIONS = 4;
// BENCH_ONLY=overruns,pdfs runs only the rows and parts named (for work on one cure); the table then has gaps.
const ONLY = (process.env.BENCH_ONLY ?? '').split(',').map((x) => x.trim()).filter(Boolean);
const wanted = (name: string) => !ONLY.length || ONLY.some((o) => name.includes(o));
const WEB_DIR = path.join(ROOT, 'dist');
const TSX = path.join(ROOT, 'node_modules/.bin/tsx');

const log = (msg: string) => process.stderr.write(`[bench] ${msg}\n`);

// ---- databases ----

/** What the seeded data depends on: the seeder and the schema. A change to either seeds afresh. */
function fingerprint(): string {
  const h = createHash('sha1');
  for (const f of ['bench/seed.ts', 'seeds/demo.ts']) h.update(fs.readFileSync(path.join(ROOT, f)));
  for (const f of fs.readdirSync(path.join(ROOT, 'migrations')).sort()) h.update(f).update(fs.readFileSync(path.join(ROOT, 'migrations', f)));
  return h.digest('hex').slice(0, 16);
}

async function ensureDatabase(scale: number): Promise<{ url: string; counts: BenchCounts | null; seededMs: number | null }> {
  const name = `feltwire_bench_${scale}`;
  const url = `${PG}/${name}`;
  const mark = `feltwire-bench ${fingerprint()}`;
  const admin = knexFactory({ client: 'pg', connection: `${PG}/postgres`, pool: { min: 0, max: 1 } });
  try {
    const row = (await admin.raw(`select shobj_description(oid, 'pg_database') as mark from pg_database where datname = ?`, [name])).rows[0];
    if (row?.mark === mark) {
      log(`${name}: seeded already, reusing it`);
      return { url, counts: null, seededMs: null };
    }
    log(`${name}: seeding ${scale.toLocaleString('en-US')} pianos`);
    await admin.raw('drop database if exists ?? with (force)', [name]);
    await admin.raw(`create database ?? template template0 encoding 'UTF8'`, [name]);
    const t0 = performance.now();
    const knex = createKnex(url, { min: 0, max: 2 });
    bindModels(knex);
    try {
      await migrateLatest(knex);
      const counts = await seedBench(knex, { pianos: scale, passwordHash: await hashPassword(DEMO_PASSWORD) });
      await knex.raw('vacuum analyze');
      const seededMs = performance.now() - t0;
      await admin.raw(`comment on database ?? is '${mark}'`, [name]);
      log(`${name}: seeded in ${round(seededMs / 1000)} s: ${JSON.stringify(counts)}`);
      return { url, counts, seededMs };
    } finally {
      await knex.destroy();
    }
  } finally {
    await admin.destroy();
  }
}

// ---- the bench server ----

interface Running {
  base: string;
  stop: () => Promise<void>;
}

function stopChild(child: ChildProcess): Promise<void> {
  return new Promise((resolve) => {
    if (child.exitCode != null || child.signalCode != null) return resolve();
    const force = setTimeout(() => child.kill('SIGKILL'), 5000);
    child.once('exit', () => {
      clearTimeout(force);
      resolve();
    });
    child.kill('SIGTERM');
  });
}

async function waitForHealth(base: string, child: ChildProcess, timeoutMs = 60_000): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (child.exitCode != null) throw new Error(`the server exited with ${child.exitCode}`);
    try {
      if ((await fetch(`${base}/healthz`)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 20));
  }
  throw new Error(`nothing answered on ${base}/healthz`);
}

async function startBenchServer(url: string): Promise<Running> {
  const child = spawn(TSX, ['bench/server.ts', url, String(PORT), S3, WEB_DIR], { cwd: ROOT, stdio: ['ignore', 'ignore', 'inherit'] });
  const base = `http://127.0.0.1:${PORT}`;
  await waitForHealth(base, child);
  return { base, stop: () => stopChild(child) };
}

async function login(base: string, email: string): Promise<{ token: string; user: unknown }> {
  const res = await fetch(`${base}/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password: DEMO_PASSWORD }) });
  if (!res.ok) throw new Error(`sign-in as ${email} failed: ${res.status}`);
  return (await res.json()) as { token: string; user: unknown };
}

// ---- one screen's query ----

interface ScreenResult {
  statements: number;
  kb: number;
  medianMs: number;
  p99Ms: number;
  requestsPerSecond: number | null;
  samples: number;
  mode: 'autocannon' | 'sequential';
  peakRssMb: number;
}

interface ServerStats {
  statements: number;
  requests: number;
  cpuUs: number;
  peakRssMb: number;
}

async function stats(base: string): Promise<ServerStats> {
  return (await (await fetch(`${base}/__bench/stats`)).json()) as ServerStats;
}

/** Waits until the server has run no statement for a while: requests a load left in flight have finished. */
async function quiet(base: string): Promise<void> {
  let last = (await stats(base)).statements;
  for (;;) {
    await new Promise((r) => setTimeout(r, 200));
    const now = (await stats(base)).statements;
    if (now === last) return;
    last = now;
  }
}

async function once(base: string, req: ScreenRequest): Promise<{ ms: number; bytes: number; status: number; body: string }> {
  const t0 = performance.now();
  const res = await fetch(`${base}${req.path}`, { method: req.method, headers: req.headers, body: req.body });
  const body = await res.text();
  return { ms: performance.now() - t0, bytes: Buffer.byteLength(body), status: res.status, body };
}

function check(req: ScreenRequest, status: number, body: string): void {
  if (status !== 200 || body.includes('"errors"')) throw new Error(`${req.name}: ${status} ${body.slice(0, 300)}`);
}

async function cannon(base: string, req: ScreenRequest, seconds: number, connections = CONNECTIONS): Promise<autocannon.Result> {
  const result = await autocannon({ url: `${base}${req.path}`, method: req.method, headers: req.headers, body: req.body, connections, duration: seconds, timeout: 120 });
  if (result.non2xx || result.errors) throw new Error(`${req.name}: ${result.non2xx} non-2xx answers and ${result.errors} errors under load`);
  return result;
}

/** Statements and size from one request on a quiet server, then latency under load (or one by one when slow). */
async function measureScreen(base: string, req: ScreenRequest): Promise<ScreenResult> {
  await quiet(base);
  const first = await once(base, req);
  check(req, first.status, first.body);
  const before = await stats(base);
  const counted = await once(base, req);
  const after = await stats(base);
  const statements = after.statements - before.statements;
  // A request slower than a second is timed one by one, within about 15 s, not hammered.
  if (counted.ms > 1000) {
    const times = [counted.ms];
    const more = Math.max(0, Math.min(9, Math.floor(15_000 / counted.ms) - 1));
    for (let i = 0; i < more; i += 1) times.push((await once(base, req)).ms);
    return { statements, kb: round(counted.bytes / 1024), medianMs: round(median(times)), p99Ms: round(percentile(times, 99)), requestsPerSecond: null, samples: times.length, mode: 'sequential', peakRssMb: (await stats(base)).peakRssMb };
  }
  const result = await cannon(base, req, SECONDS);
  await quiet(base);
  return {
    statements,
    kb: round(counted.bytes / 1024),
    medianMs: result.latency.p50,
    p99Ms: result.latency.p99,
    requestsPerSecond: round(result.requests.average),
    samples: result.requests.total,
    mode: 'autocannon',
    peakRssMb: (await stats(base)).peakRssMb,
  };
}

/** The stock list through GraphQL and through the plain route, alternating, in one run: requests a second, and server CPU per request. */
async function compareStock(base: string, gql: ScreenRequest, plain: ScreenRequest) {
  await quiet(base);
  const rps = { graphql: [] as number[], plain: [] as number[] };
  const cpu = { graphql: [] as number[], plain: [] as number[] };
  for (const r of [gql, plain]) await cannon(base, r, 1, LOAD_CONNECTIONS);
  for (let i = 0; i < ROUNDS; i += 1) {
    for (const [name, req] of [['graphql', gql], ['plain', plain]] as const) {
      await quiet(base);
      const before = await stats(base);
      rps[name].push((await cannon(base, req, 2, LOAD_CONNECTIONS)).requests.average);
      await quiet(base);
      const after = await stats(base);
      cpu[name].push((after.cpuUs - before.cpuUs) / Math.max(1, after.requests - before.requests));
    }
  }
  const ratios = rps.graphql.map((g, i) => g / rps.plain[i]);
  const cpuRatios = cpu.graphql.map((g, i) => cpu.plain[i] / g);
  return {
    graphqlRps: round(median(rps.graphql)),
    plainRps: round(median(rps.plain)),
    ratio: round(median(ratios), 2),
    graphqlCpuUs: round(median(cpu.graphql), 0),
    plainCpuUs: round(median(cpu.plain), 0),
    cpuRatio: round(median(cpuRatios), 2),
    rounds: ROUNDS,
  };
}

// ---- what a browser downloads ----

interface Download {
  url: string;
  kind: 'js' | 'font' | 'other';
  rawBytes: number;
  gzipBytes: number;
  wireBytes: number;
  encoding: string | null;
  cacheControl: string | null;
}

async function pageLoad(base: string, pathname: string, opts: { session?: unknown; identity: boolean; ready: string }): Promise<Download[]> {
  const dir = fs.mkdtempSync(path.join(process.env.TMPDIR ?? os.tmpdir(), 'fw-bench-chromium-'));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    headless: true,
    viewport: { width: 390, height: 844 },
    extraHTTPHeaders: opts.identity ? { 'Accept-Encoding': 'identity' } : undefined,
  });
  try {
    if (opts.session) await context.addInitScript((s: string) => localStorage.setItem('feltwire.session', s), JSON.stringify(opts.session));
    const page = await context.newPage();
    const pending: Promise<Download>[] = [];
    page.on('response', (res) => {
      const url = res.url();
      if (!url.startsWith(base) || res.status() !== 200) return;
      pending.push(
        (async () => {
          const body = await res.body();
          const sizes = await res.request().sizes();
          const headers = await res.allHeaders();
          const kind = /\.js(\?|$)/.test(url) ? 'js' : /\.(woff2?|ttf|otf)(\?|$)/.test(url) ? 'font' : 'other';
          return { url: url.slice(base.length), kind, rawBytes: body.length, gzipBytes: zlib.gzipSync(body).length, wireBytes: sizes.responseBodySize, encoding: headers['content-encoding'] ?? null, cacheControl: headers['cache-control'] ?? null } as Download;
        })(),
      );
    });
    await page.goto(`${base}${pathname}`, { waitUntil: 'networkidle' });
    await page.getByTestId(opts.ready).first().waitFor({ timeout: 30_000 });
    await page.waitForLoadState('networkidle');
    return await Promise.all(pending);
  } finally {
    await context.close();
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

function sum(list: Download[], kind: Download['kind'], key: 'rawBytes' | 'gzipBytes' | 'wireBytes'): number {
  return round(list.filter((d) => d.kind === kind).reduce((s, d) => s + d[key], 0) / 1024);
}

async function measureBundles(base: string, buyerToken: string, session: unknown) {
  const pages = { staff: { path: '/', session, ready: 'home-heading' }, buyer: { path: `/d/${buyerToken}`, session: undefined, ready: 'disclosure-title' } };
  const out: Record<string, unknown> = {};
  for (const [name, p] of Object.entries(pages)) {
    const compressed = await pageLoad(base, p.path, { session: p.session, identity: false, ready: p.ready });
    const identity = await pageLoad(base, p.path, { session: p.session, identity: true, ready: p.ready });
    out[name] = {
      jsFiles: compressed.filter((d) => d.kind === 'js').map((d) => ({ url: d.url, kb: round(d.rawBytes / 1024), gzipKb: round(d.gzipBytes / 1024), encoding: d.encoding, cacheControl: d.cacheControl })),
      jsKb: sum(compressed, 'js', 'rawBytes'),
      jsGzipKb: sum(compressed, 'js', 'gzipBytes'),
      jsWireKb: sum(compressed, 'js', 'wireBytes'),
      jsWireKbUncompressed: sum(identity, 'js', 'wireBytes'),
      fontFiles: compressed.filter((d) => d.kind === 'font').map((d) => ({ url: d.url, kb: round(d.rawBytes / 1024), cacheControl: d.cacheControl })),
      fontKb: sum(compressed, 'font', 'wireBytes'),
      allWireKb: round(compressed.reduce((s, d) => s + d.wireBytes, 0) / 1024),
      allWireKbUncompressed: round(identity.reduce((s, d) => s + d.wireBytes, 0) / 1024),
      indexCacheControl: compressed.find((d) => d.url === p.path || d.url.endsWith('.html'))?.cacheControl ?? null,
    };
  }
  // Every entry the export made, whether or not a page loads it.
  const jsDir = path.join(WEB_DIR, '_expo/static/js/web');
  const entries = fs.existsSync(jsDir)
    ? fs.readdirSync(jsDir).filter((f) => f.endsWith('.js')).map((f) => {
        const body = fs.readFileSync(path.join(jsDir, f));
        return { file: f, kb: round(body.length / 1024), gzipKb: round(zlib.gzipSync(body).length / 1024) };
      })
    : [];
  return { ...out, entries };
}

// ---- the server's start ----

async function measureStart(url: string): Promise<{ medianMs: number; samples: number[] }> {
  const samples: number[] = [];
  for (let i = 0; i < 5; i += 1) {
    const t0 = performance.now();
    const child = spawn(TSX, ['server/main.ts'], {
      cwd: ROOT,
      stdio: ['ignore', 'ignore', 'inherit'],
      env: { ...process.env, DATABASE_URL: url, PORT: String(START_PORT), SEED_DEMO: '0', JWT_SECRET: BENCH_JWT_SECRET, S3_ENDPOINT: S3, MAIL_FAKE_PORT: String(MAIL_PORT), STRIPE_API_URL: 'http://127.0.0.1:9', WEB_DIR },
    });
    try {
      await waitForHealth(`http://127.0.0.1:${START_PORT}`, child);
      samples.push(round(performance.now() - t0, 0));
    } finally {
      await stopChild(child);
    }
  }
  return { medianMs: median(samples), samples };
}

// ---- pitch from a recording, when that module is there ----

async function measureTone(): Promise<{ realTimeFactor: number; raw: string } | { skipped: string }> {
  const file = path.join(ROOT, 'bench/tone.ts');
  if (!fs.existsSync(file)) return { skipped: 'bench/tone.ts is not in this checkout' };
  const child = spawn(TSX, [file], { cwd: ROOT, stdio: ['ignore', 'pipe', 'inherit'] });
  let out = '';
  child.stdout!.on('data', (c: Buffer) => (out += c.toString()));
  const timer = setTimeout(() => child.kill('SIGKILL'), 180_000);
  const code: number = await new Promise((resolve) => child.once('exit', (c) => resolve(c ?? 1)));
  clearTimeout(timer);
  if (code !== 0) return { skipped: `bench/tone.ts exited with ${code}` };
  // It prints JSON with `realTimeFactor`, or a line naming the real-time factor.
  const json = out.split('\n').reverse().find((l) => l.trim().startsWith('{'));
  const fromJson = json ? Number((JSON.parse(json) as { realTimeFactor?: number }).realTimeFactor) : NaN;
  const fromText = Number(/real[- ]time factor\D*([\d.]+)/i.exec(out)?.[1]);
  const rtf = Number.isFinite(fromJson) ? fromJson : fromText;
  return Number.isFinite(rtf) ? { realTimeFactor: rtf, raw: out.trim().slice(-500) } : { skipped: 'bench/tone.ts printed no real-time factor' };
}

// ---- the table ----

function screenCell(s: ScreenResult | undefined): string {
  if (!s) return '-';
  return `${s.medianMs} / ${s.p99Ms} ms, ${s.statements} st, ${s.kb} KB${s.mode === 'sequential' ? ` (${s.samples} one by one)` : ''}`;
}

export function renderTable(r: BenchResults): string {
  const [small, large] = [String(r.scales.small), String(r.scales.large)];
  const head = `| what | ${r.scales.small.toLocaleString('en-US')} pianos | ${r.scales.large.toLocaleString('en-US')} pianos |`;
  const lines = [head, '|---|---|---|'];
  for (const [name, byScale] of Object.entries(r.screens)) lines.push(`| ${name}: median / p99, SQL statements, size | ${screenCell(byScale[small])} | ${screenCell(byScale[large])} |`);
  const c = r.stockCompare;
  const ratio = (x: BenchResults['stockCompare'][string] | undefined) => (x ? `${x.graphqlRps} / ${x.plainRps} = **${x.ratio}**` : '-');
  const cpuRatio = (x: BenchResults['stockCompare'][string] | undefined) => (x?.cpuRatio != null ? `${x.plainCpuUs} / ${x.graphqlCpuUs} us = **${x.cpuRatio}**` : '-');
  if (c[small] || c[large]) {
    lines.push(`| stock list, GraphQL / plain route, requests/s | ${ratio(c[small])} | ${ratio(c[large])} |`);
    lines.push(`| stock list, plain route / GraphQL, server CPU per request | ${cpuRatio(c[small])} | ${cpuRatio(c[large])} |`);
  }
  const b = r.bundles as Record<string, { jsGzipKb: number; jsKb: number; jsWireKb: number; jsWireKbUncompressed: number; fontKb: number }> | null;
  for (const [label, key] of [['staff first load', 'staff'], ['buyer /d/<token>', 'buyer']] as const) {
    const x = b?.[key];
    if (x) lines.push(`| ${label}: JS gzipped (raw); on the wire compressed / uncompressed; fonts | - | ${x.jsGzipKb} KB (${x.jsKb} KB); ${x.jsWireKb} / ${x.jsWireKbUncompressed} KB; ${x.fontKb} KB |`);
  }
  if (r.pdfs.samples) lines.push(`| disclosure PDF / floor-tag PDF, warm median | - | ${r.pdfs.disclosureMs} / ${r.pdfs.floorTagMs} ms |`);
  if (Number.isFinite(r.tokenCheck.serverUs)) lines.push(`| token check: the server's / with a string secret / with a key object, per request | ${r.tokenCheck.serverUs} / ${r.tokenCheck.stringSecretUs} / ${r.tokenCheck.keyObjectUs} us | - |`);
  if (r.serverStart.samples.length) lines.push(`| server start to first /healthz, median of ${r.serverStart.samples.length} | ${r.serverStart.medianMs} ms | - |`);
  lines.push(`| pitch from a recording, real-time factor | ${'realTimeFactor' in r.tone ? r.tone.realTimeFactor : `skipped: ${r.tone.skipped}`} | - |`);
  return lines.join('\n');
}

/** Before and after, side by side: `bench/baseline.json` (the code before the cures) against this run. */
export function renderComparison(before: BenchResults, now: BenchResults): string {
  const [small, large] = [String(now.scales.small), String(now.scales.large)];
  const n = (v: number) => v.toLocaleString('en-US');
  const lines = [
    `| what | before, ${n(before.scales.small)} pianos | now | before, ${n(before.scales.large)} pianos | now |`,
    '|---|---|---|---|---|',
  ];
  for (const name of Object.keys(now.screens)) {
    const b = before.screens[name] ?? {};
    const a = now.screens[name];
    lines.push(`| ${name} | ${screenCell(b[small])} | ${screenCell(a[small])} | ${screenCell(b[large])} | ${screenCell(a[large])} |`);
  }
  const ratio = (x?: BenchResults['stockCompare'][string]) => (x ? `**${x.ratio}** (${x.graphqlRps} / ${x.plainRps})${x.cpuRatio != null ? `; CPU **${x.cpuRatio}**` : ''}` : '-');
  lines.push(`| stock list, GraphQL / plain route, requests/s (and plain / GraphQL CPU per request) | ${ratio(before.stockCompare[small])} | ${ratio(now.stockCompare[small])} | ${ratio(before.stockCompare[large])} | ${ratio(now.stockCompare[large])} |`);
  type Weights = Record<string, { jsGzipKb: number; jsWireKb: number; jsWireKbUncompressed: number; fontKb: number }>;
  const bb = before.bundles as Weights | null;
  const ab = now.bundles as Weights | null;
  for (const [label, key] of [['staff first load: JS gzipped; JS on the wire; fonts', 'staff'], ['buyer /d/<token>: JS gzipped; JS on the wire; fonts', 'buyer']] as const) {
    const cell = (x?: Weights[string]) => (x ? `**${x.jsGzipKb} KB**; ${x.jsWireKb} KB; ${x.fontKb} KB` : '-');
    lines.push(`| ${label} | | | ${cell(bb?.[key])} | ${cell(ab?.[key])} |`);
  }
  lines.push(`| disclosure / floor-tag PDF, warm median | | | ${before.pdfs.disclosureMs} / ${before.pdfs.floorTagMs} ms | ${now.pdfs.disclosureMs} / ${now.pdfs.floorTagMs} ms |`);
  lines.push(`| token check, per request | ${before.tokenCheck.serverUs} us | ${now.tokenCheck.serverUs} us | | |`);
  lines.push(`| server start to first /healthz, median | ${before.serverStart.medianMs} ms | ${now.serverStart.medianMs} ms | | |`);
  return lines.join('\n');
}

export interface BenchResults {
  ranAt: string;
  machine: { cpus: number; node: string };
  scales: { small: number; large: number };
  seconds: number;
  connections: number;
  loadConnections: number;
  data: Record<string, BenchCounts | null>;
  screens: Record<string, Record<string, ScreenResult>>;
  stockCompare: Record<string, { graphqlRps: number; plainRps: number; ratio: number; graphqlCpuUs: number; plainCpuUs: number; cpuRatio: number; rounds: number }>;
  bundles: unknown;
  pdfs: { disclosureMs: number; floorTagMs: number; samples: number };
  tokenCheck: { serverUs: number; stringSecretUs: number; keyObjectUs: number };
  serverStart: { medianMs: number; samples: number[] };
  tone: { realTimeFactor: number; raw: string } | { skipped: string };
  benchSeconds: number;
}

async function targets(url: string): Promise<Targets> {
  const knex: Knex = knexFactory({ client: 'pg', connection: url, pool: { min: 0, max: 1 } });
  try {
    const inWorkshop = await knex('work_plans').join('pianos', 'pianos.id', 'work_plans.piano_id').where('pianos.stage', 'in_workshop').orderBy('pianos.id').first('pianos.id');
    const onFloor = await knex('disclosure_links').join('pianos', 'pianos.id', 'disclosure_links.piano_id').where('pianos.stage', 'on_floor').orderBy('pianos.id').first('disclosure_links.token');
    return { pianoId: inWorkshop.id, disclosureToken: onFloor.token };
  } finally {
    await knex.destroy();
  }
}

async function main(): Promise<void> {
  const t0 = performance.now();
  if (!fs.existsSync(path.join(WEB_DIR, 'index.html'))) throw new Error('dist/ is missing: run npm run web:build (scripts/bench.sh does)');
  const scales = [SMALL, LARGE];
  const results: BenchResults = {
    ranAt: new Date().toISOString(),
    machine: { cpus: os.cpus().length, node: process.version },
    scales: { small: SMALL, large: LARGE },
    seconds: SECONDS,
    connections: CONNECTIONS,
    loadConnections: LOAD_CONNECTIONS,
    data: {},
    screens: {},
    stockCompare: {},
    bundles: null,
    pdfs: { disclosureMs: NaN, floorTagMs: NaN, samples: 0 },
    tokenCheck: { serverUs: NaN, stringSecretUs: NaN, keyObjectUs: NaN },
    serverStart: { medianMs: NaN, samples: [] },
    tone: { skipped: 'not run' },
    benchSeconds: 0,
  };
  const dbs: Record<number, string> = {};
  for (const scale of scales) {
    const db = await ensureDatabase(scale);
    dbs[scale] = db.url;
    results.data[scale] = db.counts;
  }
  for (const scale of scales) {
    log(`screens at ${scale.toLocaleString('en-US')} pianos`);
    const server = await startBenchServer(dbs[scale]);
    try {
      const manager = await login(server.base, 'manager@feltwire.test');
      const tech = await login(server.base, 'tech@feltwire.test');
      const t = await targets(dbs[scale]);
      const requests = screenRequests({ manager: manager.token, technician: tech.token }, t);
      for (const req of requests.screens.filter((r) => wanted(r.name))) {
        log(`  ${req.name}`);
        (results.screens[req.name] ??= {})[scale] = await measureScreen(server.base, req);
      }
      if (wanted('compare')) {
        log('  stock list: GraphQL against the plain route');
        results.stockCompare[scale] = await compareStock(server.base, requests.stockGraphql, requests.stockPlain);
      }
      if (scale === LARGE && wanted('bundles')) {
        log('  what a browser downloads');
        results.bundles = await measureBundles(server.base, t.disclosureToken, manager);
      }
      if (scale === LARGE && wanted('pdfs')) {
        log('  PDFs');
        results.pdfs = await measurePdfs(dbs[scale]);
      }
    } finally {
      await server.stop();
    }
  }
  if (wanted('token')) {
    log('token check');
    results.tokenCheck = await measureTokenCheck();
  }
  if (wanted('start')) {
    log('server start');
    results.serverStart = await measureStart(dbs[SMALL]);
  }
  if (wanted('tone')) {
    log('pitch from a recording');
    results.tone = await measureTone();
  }
  results.benchSeconds = round((performance.now() - t0) / 1000, 0);

  const table = renderTable(results);
  // A partial run prints its rows but keeps the last full table on disk.
  const out = ONLY.length ? 'bench/results-partial' : 'bench/results';
  fs.writeFileSync(path.join(ROOT, `${out}.json`), `${JSON.stringify(results, null, 2)}\n`);
  const baselineFile = path.join(ROOT, 'bench/baseline.json');
  const comparison = !ONLY.length && fs.existsSync(baselineFile) ? renderComparison(JSON.parse(fs.readFileSync(baselineFile, 'utf8')) as BenchResults, results) : null;
  fs.writeFileSync(path.join(ROOT, `${out}.md`), `${table}\n${comparison ? `\nBefore the cures (bench/baseline.json) and now:\n\n${comparison}\n` : ''}`);
  process.stdout.write(`\n${table}\n\nbench took ${results.benchSeconds} s; written to ${out}.json and ${out}.md\n`);
}

if (require.main === module) {
  main().catch((err) => {
    console.error(err);
    process.exit(1);
  });
}
