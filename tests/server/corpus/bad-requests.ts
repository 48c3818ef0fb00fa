// Malformed, oversized, forged and ill-placed requests for every route of the server, replayed by
// tests/server/corpus.test.ts: each must answer below 500 with a message and change nothing.
// {token} is a published disclosure's link, {pianoId} a piano on the floor, {messageId} an e-mail in the inbox.
import fs from 'node:fs';
import path from 'node:path';

import Stripe from 'stripe';

import type { Role } from '@/modules/accounts/core/roles';
import { MAX_PHOTO_BYTES } from '@/modules/photos/core/photo-rules';

/** What a request for a path the server does not route is filed under. */
export const NO_ROUTE = '(no route)';

export interface BadRequest {
  name: string;
  /** the route as the app lists it: METHOD and path pattern */
  route: string;
  /** the address sent, when it is not the route's pattern */
  url?: string;
  as?: Role;
  headers?: Record<string, string>;
  json?: unknown;
  raw?: { type: string; body: string | Buffer };
  multipart?: { fields?: Record<string, string>; file?: { content: Buffer; filename: string; contentType: string } };
  gql?: { query: string; variables?: Record<string, unknown> };
}

const JPEG = fs.readFileSync(path.join(__dirname, '../../fixtures/keys-photo.jpg'));
const PNG = fs.readFileSync(path.join(__dirname, '../../fixtures/keys-photo.png'));
const NUL = 'Ab\u0000rams';
const HUGE = 'x'.repeat(120 * 1024);
const TOKEN_SHAPED = 'A'.repeat(32);
const DIGEST = '0'.repeat(64);
const DRAFT = 'draft-0123456789abcdef';
// A RIFF/WAVE header of 16-bit mono PCM at 44.1 kHz that announces no samples at all.
const WAV_HEADER_ONLY = Buffer.from('UklGRiQAAABXQVZFZm10IBAAAAABAAEARKwAAIhYAQACABAAZGF0YQAAAAA=', 'base64');

const event = JSON.stringify({ id: 'evt_corpus_1', type: 'checkout.session.completed', data: { object: { id: 'cs_corpus_1', payment_status: 'paid' } } });
const signedWith = (secret: string, timestamp?: number) => Stripe.webhooks.generateTestHeaderString({ payload: event, secret, timestamp });

const rest: BadRequest[] = [
  // the health check takes no writes
  { name: 'POST to the health check', route: NO_ROUTE, url: '/healthz', raw: { type: 'application/json', body: '{}' } },
  // sign-in
  { name: 'sign-in without a body', route: 'POST /auth/login' },
  { name: 'sign-in with JSON that ends early', route: 'POST /auth/login', raw: { type: 'application/json', body: '{"email":' } },
  { name: 'sign-in as a form', route: 'POST /auth/login', raw: { type: 'application/x-www-form-urlencoded', body: 'email=manager%40feltwire.test&password=x' } },
  { name: 'sign-in as text', route: 'POST /auth/login', raw: { type: 'text/plain', body: 'manager@feltwire.test' } },
  { name: 'sign-in with a NUL in the e-mail', route: 'POST /auth/login', json: { email: 'manager\u0000@feltwire.test', password: 'x' } },
  { name: 'sign-in with a password of a number', route: 'POST /auth/login', json: { email: 'manager@feltwire.test', password: 12345 } },
  { name: 'sign-in with an e-mail of an object', route: 'POST /auth/login', json: { email: { $ne: '' }, password: 'x' } },
  { name: 'sign-in with a body of an array', route: 'POST /auth/login', json: [1, 2, 3] },
  { name: 'sign-in with a body over 10 KB', route: 'POST /auth/login', json: { email: HUGE, password: 'x' } },
  { name: 'sign-in in Latin-1', route: 'POST /auth/login', raw: { type: 'application/json; charset=latin1', body: '{"email":"a"}' } },
  { name: 'sign-in gzip-encoded in name only', route: 'POST /auth/login', headers: { 'Content-Encoding': 'gzip' }, raw: { type: 'application/json', body: '{"email":"a"}' } },
  { name: 'sign-in in an unknown encoding', route: 'POST /auth/login', headers: { 'Content-Encoding': 'compress' }, raw: { type: 'application/json', body: '{"email":"a"}' } },
  { name: 'GET on the sign-in', route: NO_ROUTE, url: '/auth/login' },
  // the payment webhook
  { name: 'webhook without a signature', route: 'POST /api/webhooks/payments', raw: { type: 'application/json', body: event } },
  { name: 'webhook signed with another secret', route: 'POST /api/webhooks/payments', headers: { 'Stripe-Signature': signedWith('whsec_forged_by_someone_else') }, raw: { type: 'application/json', body: event } },
  { name: 'webhook with a signature from 2001', route: 'POST /api/webhooks/payments', headers: { 'Stripe-Signature': signedWith('whsec_forged_by_someone_else', 1_000_000_000) }, raw: { type: 'application/json', body: event } },
  { name: 'webhook with a garbled signature header', route: 'POST /api/webhooks/payments', headers: { 'Stripe-Signature': 't=abc,v1=' }, raw: { type: 'application/json', body: event } },
  { name: 'webhook that is not JSON', route: 'POST /api/webhooks/payments', headers: { 'Stripe-Signature': 't=1,v1=00' }, raw: { type: 'text/plain', body: 'hello' } },
  { name: 'webhook over 256 KB', route: 'POST /api/webhooks/payments', raw: { type: 'application/json', body: JSON.stringify({ pad: 'x'.repeat(300 * 1024) }) } },
  // the buyer's disclosure
  { name: 'disclosure by a token of the wrong shape', route: 'GET /api/public/disclosures/:token', url: "/api/public/disclosures/'%20or%201=1%20--" },
  { name: 'disclosure by an unknown token', route: 'GET /api/public/disclosures/:token', url: `/api/public/disclosures/${TOKEN_SHAPED}` },
  { name: 'disclosure version past the integer range', route: 'GET /api/public/disclosures/:token', url: '/api/public/disclosures/{token}?version=99999999999' },
  { name: 'disclosure version 0', route: 'GET /api/public/disclosures/:token', url: '/api/public/disclosures/{token}?version=0' },
  { name: 'disclosure version -1', route: 'GET /api/public/disclosures/:token', url: '/api/public/disclosures/{token}?version=-1' },
  { name: 'disclosure version 1.5', route: 'GET /api/public/disclosures/:token', url: '/api/public/disclosures/{token}?version=1.5' },
  { name: 'disclosure version left empty', route: 'GET /api/public/disclosures/:token', url: '/api/public/disclosures/{token}?version=' },
  { name: 'disclosure version that does not exist', route: 'GET /api/public/disclosures/:token', url: '/api/public/disclosures/{token}?version=999' },
  { name: 'disclosure token with a broken percent-encoding', route: 'GET /api/public/disclosures/:token', url: '/api/public/disclosures/%E0%A4%A' },
  { name: 'printable disclosure at version 2^31', route: 'GET /api/public/disclosures/:token/html', url: '/api/public/disclosures/{token}/html?version=2147483648' },
  { name: 'printable disclosure at version 1e309', route: 'GET /api/public/disclosures/:token/html', url: '/api/public/disclosures/{token}/html?version=1e309' },
  { name: 'printable disclosure of an unknown token', route: 'GET /api/public/disclosures/:token/html', url: `/api/public/disclosures/${TOKEN_SHAPED}/html` },
  // the catalogue
  { name: 'catalogue of a kind that is not one', route: 'GET /api/public/pianos', url: '/api/public/pianos?kind=organ' },
  { name: 'catalogue with a size in words', route: 'GET /api/public/pianos', url: '/api/public/pianos?minSizeCm=big' },
  { name: 'catalogue with a price past the integer range', route: 'GET /api/public/pianos', url: '/api/public/pianos?maxPriceMinor=2147483648' },
  { name: 'catalogue with a price of 1e309', route: 'GET /api/public/pianos', url: '/api/public/pianos?minPriceMinor=1e309' },
  { name: 'catalogue with a filter given twice', route: 'GET /api/public/pianos', url: '/api/public/pianos?kind=grand&kind=upright' },
  { name: 'catalogue with a filter as an object', route: 'GET /api/public/pianos', url: '/api/public/pianos?maxPriceMinor[$gt]=0' },
  { name: 'catalogue with an unknown filter', route: 'GET /api/public/pianos', url: "/api/public/pianos?stage=sold'%20or%201=1" },
  { name: 'catalogue with a range upside down', route: 'GET /api/public/pianos', url: '/api/public/pianos?minSizeCm=200&maxSizeCm=100' },
  { name: 'catalogue at offset -1', route: 'GET /api/public/pianos', url: '/api/public/pianos?offset=-1' },
  { name: 'POST to the catalogue', route: NO_ROUTE, url: '/api/public/pianos', raw: { type: 'application/json', body: '{}' } },
  // acknowledgements
  { name: 'acknowledgement without a body', route: 'POST /api/public/disclosures/:token/acknowledge', url: '/api/public/disclosures/{token}/acknowledge' },
  { name: 'acknowledgement with a stale digest', route: 'POST /api/public/disclosures/:token/acknowledge', url: '/api/public/disclosures/{token}/acknowledge', json: { fullName: 'Ada Brightwell', email: 'ada@example.test', read: true, digest: DIGEST } },
  { name: 'acknowledgement not ticked as read', route: 'POST /api/public/disclosures/:token/acknowledge', url: '/api/public/disclosures/{token}/acknowledge', json: { fullName: 'Ada Brightwell', email: 'ada@example.test', read: 'yes', digest: DIGEST } },
  { name: 'acknowledgement with a NUL in the name', route: 'POST /api/public/disclosures/:token/acknowledge', url: '/api/public/disclosures/{token}/acknowledge', json: { fullName: NUL, email: 'ada@example.test', read: true, digest: DIGEST } },
  { name: 'acknowledgement with a name of 300 characters', route: 'POST /api/public/disclosures/:token/acknowledge', url: '/api/public/disclosures/{token}/acknowledge', json: { fullName: 'A'.repeat(300), email: 'ada@example.test', read: true, digest: DIGEST } },
  { name: 'acknowledgement with an e-mail that is not one', route: 'POST /api/public/disclosures/:token/acknowledge', url: '/api/public/disclosures/{token}/acknowledge', json: { fullName: 'Ada Brightwell', email: 'ada at example', read: true, digest: DIGEST } },
  { name: 'acknowledgement with an extra field', route: 'POST /api/public/disclosures/:token/acknowledge', url: '/api/public/disclosures/{token}/acknowledge', json: { fullName: 'Ada Brightwell', email: 'ada@example.test', read: true, digest: DIGEST, countersignedById: 1 } },
  { name: 'acknowledgement over 4 KB', route: 'POST /api/public/disclosures/:token/acknowledge', url: '/api/public/disclosures/{token}/acknowledge', json: { fullName: 'x'.repeat(5000) } },
  { name: 'acknowledgement as a form', route: 'POST /api/public/disclosures/:token/acknowledge', url: '/api/public/disclosures/{token}/acknowledge', raw: { type: 'application/x-www-form-urlencoded', body: 'fullName=Ada' } },
  { name: 'acknowledgement of an unknown token', route: 'POST /api/public/disclosures/:token/acknowledge', url: `/api/public/disclosures/${TOKEN_SHAPED}/acknowledge`, json: { fullName: 'Ada Brightwell', email: 'ada@example.test', read: true, digest: DIGEST } },
  // deposits
  // the check of a paper's verification code
  { name: 'check with a code too short', route: 'GET /api/public/check/:code', url: '/api/public/check/7K3Q' },
  { name: 'check with a code of letters not in the alphabet', route: 'GET /api/public/check/:code', url: '/api/public/check/UUUU-UUUU-UUUU' },
  { name: 'check with a NUL in the code', route: 'GET /api/public/check/:code', url: '/api/public/check/7K3Q-M9TD-20X%00' },
  { name: 'check with a code of 300 characters', route: 'GET /api/public/check/:code', url: `/api/public/check/${'7'.repeat(300)}` },
  { name: 'checked page without an id', route: 'GET /api/public/check/:code/html', url: '/api/public/check/7K3Q-M9TD-20XF/html' },
  { name: 'checked page with an id of letters', route: 'GET /api/public/check/:code/html', url: '/api/public/check/7K3Q-M9TD-20XF/html?id=abc' },
  { name: 'checked page with a code that fits no version', route: 'GET /api/public/check/:code/html', url: '/api/public/check/0000-0000-0000/html?id=1' },
  { name: 'checked page with a malformed code', route: 'GET /api/public/check/:code/html', url: '/api/public/check/x/html?id=1' },
  { name: 'deposit without a receipt', route: 'POST /api/public/disclosures/:token/deposit', url: '/api/public/disclosures/{token}/deposit', json: {} },
  { name: 'deposit with an unknown receipt', route: 'POST /api/public/disclosures/:token/deposit', url: '/api/public/disclosures/{token}/deposit', json: { receiptToken: TOKEN_SHAPED } },
  { name: 'deposit with a receipt of a number', route: 'POST /api/public/disclosures/:token/deposit', url: '/api/public/disclosures/{token}/deposit', json: { receiptToken: 42 } },
  { name: 'deposit with a NUL in the receipt', route: 'POST /api/public/disclosures/:token/deposit', url: '/api/public/disclosures/{token}/deposit', json: { receiptToken: `${'A'.repeat(31)}\u0000` } },
  { name: 'deposit as text', route: 'POST /api/public/disclosures/:token/deposit', url: '/api/public/disclosures/{token}/deposit', raw: { type: 'text/plain', body: 'receiptToken' } },
  { name: 'deposit over 4 KB', route: 'POST /api/public/disclosures/:token/deposit', url: '/api/public/disclosures/{token}/deposit', json: { receiptToken: 'x'.repeat(5000) } },
  { name: 'deposit on an unknown token', route: 'POST /api/public/disclosures/:token/deposit', url: `/api/public/disclosures/${TOKEN_SHAPED}/deposit`, json: { receiptToken: TOKEN_SHAPED } },
  { name: 'balance on an unknown token', route: 'POST /api/public/disclosures/:token/balance', url: `/api/public/disclosures/${TOKEN_SHAPED}/balance` },
  { name: 'balance of a piano not sold yet', route: 'POST /api/public/disclosures/:token/balance', url: '/api/public/disclosures/{token}/balance' },
  { name: 'deposit status without a session', route: 'GET /api/public/disclosures/:token/deposit', url: '/api/public/disclosures/{token}/deposit' },
  { name: 'deposit status of a session of the wrong shape', route: 'GET /api/public/disclosures/:token/deposit', url: '/api/public/disclosures/{token}/deposit?session=%00%00' },
  { name: 'deposit status of an unknown session', route: 'GET /api/public/disclosures/:token/deposit', url: '/api/public/disclosures/{token}/deposit?session=cs_test_unknown_session_1' },
  { name: 'deposit status with the session twice', route: 'GET /api/public/disclosures/:token/deposit', url: '/api/public/disclosures/{token}/deposit?session=cs_a12345678&session=cs_b12345678' },
  // signed copies by receipt
  { name: 'signed copy by an unknown receipt', route: 'GET /api/public/receipts/:token.pdf', url: `/api/public/receipts/${TOKEN_SHAPED}.pdf` },
  { name: 'signed copy by a receipt of the wrong shape', route: 'GET /api/public/receipts/:token.pdf', url: '/api/public/receipts/..%2F..%2Fetc%2Fpasswd.pdf' },
  // photos
  { name: 'photo without a sign-in', route: 'POST /api/photos', multipart: { fields: { area: 'keys', draftKey: DRAFT }, file: { content: JPEG, filename: 'keys.jpg', contentType: 'image/jpeg' } } },
  { name: 'photo by floor staff', route: 'POST /api/photos', as: 'floor', multipart: { fields: { area: 'keys', draftKey: DRAFT }, file: { content: JPEG, filename: 'keys.jpg', contentType: 'image/jpeg' } } },
  { name: 'photo over 10 MB', route: 'POST /api/photos', as: 'intake', multipart: { fields: { area: 'keys', draftKey: DRAFT }, file: { content: Buffer.concat([JPEG, Buffer.alloc(MAX_PHOTO_BYTES)]), filename: 'big.jpg', contentType: 'image/jpeg' } } },
  { name: 'photo that is a script named .jpg', route: 'POST /api/photos', as: 'intake', multipart: { fields: { area: 'keys', draftKey: DRAFT }, file: { content: Buffer.from('#!/bin/sh\necho hi\n'), filename: 'keys.jpg', contentType: 'image/jpeg' } } },
  { name: 'photo that is a PNG said to be JPEG, in an unknown area', route: 'POST /api/photos', as: 'intake', multipart: { fields: { area: 'attic', draftKey: DRAFT }, file: { content: PNG, filename: 'keys.jpg', contentType: 'image/jpeg' } } },
  { name: 'photo with no file', route: 'POST /api/photos', as: 'intake', multipart: { fields: { area: 'keys', draftKey: DRAFT } } },
  { name: 'photo with neither piano nor draft', route: 'POST /api/photos', as: 'intake', multipart: { fields: { area: 'keys' }, file: { content: JPEG, filename: 'keys.jpg', contentType: 'image/jpeg' } } },
  { name: 'photo for a piano id past the integer range', route: 'POST /api/photos', as: 'intake', multipart: { fields: { area: 'keys', pianoId: '99999999999' }, file: { content: JPEG, filename: 'keys.jpg', contentType: 'image/jpeg' } } },
  { name: 'photo with a NUL in the caption', route: 'POST /api/photos', as: 'intake', multipart: { fields: { area: 'keys', draftKey: DRAFT, caption: NUL }, file: { content: JPEG, filename: 'keys.jpg', contentType: 'image/jpeg' } } },
  { name: 'photo multipart without a boundary', route: 'POST /api/photos', as: 'intake', raw: { type: 'multipart/form-data', body: 'photo' } },
  { name: 'photo multipart cut short', route: 'POST /api/photos', as: 'intake', raw: { type: 'multipart/form-data; boundary=b0undary', body: '--b0undary\r\nContent-Disposition: form-data; name="area"\r\n\r\nkeys\r\n--b0undary\r\nContent-Disposition: form-data; name="photo"; filename="a.jpg"\r\nContent-Type: image/jpeg\r\n\r\n\xff\xd8\xff' } },
  { name: 'photo multipart with a broken part header', route: 'POST /api/photos', as: 'intake', raw: { type: 'multipart/form-data; boundary=b0undary', body: '--b0undary\r\nContent-Disposition\r\n\r\nkeys\r\n--b0undary--\r\n' } },
  { name: 'photo with two files', route: 'POST /api/photos', as: 'intake', raw: { type: 'multipart/form-data; boundary=b0undary', body: ['photo', 'photo'].map((n) => `--b0undary\r\nContent-Disposition: form-data; name="${n}"; filename="a.jpg"\r\nContent-Type: image/jpeg\r\n\r\nxx\r\n`).join('') + '--b0undary--\r\n' } },
  { name: 'photo as JSON', route: 'POST /api/photos', as: 'intake', json: { photo: 'data:image/jpeg;base64,/9j/' } },
  // play-test recordings
  { name: 'recording without a sign-in', route: 'POST /api/recordings', multipart: { fields: { draftKey: DRAFT }, file: { content: WAV_HEADER_ONLY, filename: 'take.wav', contentType: 'audio/wav' } } },
  { name: 'recording that is a JPEG named .wav', route: 'POST /api/recordings', as: 'technician', multipart: { fields: { draftKey: DRAFT }, file: { content: JPEG, filename: 'take.wav', contentType: 'audio/wav' } } },
  { name: 'recording that is a bare WAV header', route: 'POST /api/recordings', as: 'technician', multipart: { fields: { draftKey: DRAFT }, file: { content: WAV_HEADER_ONLY, filename: 'take.wav', contentType: 'audio/wav' } } },
  { name: 'recording with no file', route: 'POST /api/recordings', as: 'technician', multipart: { fields: { draftKey: DRAFT } } },
  { name: 'recording for a piano id past the integer range', route: 'POST /api/recordings', as: 'technician', multipart: { fields: { pianoId: '99999999999' }, file: { content: WAV_HEADER_ONLY, filename: 'take.wav', contentType: 'audio/wav' } } },
  { name: 'recording multipart without a boundary', route: 'POST /api/recordings', as: 'technician', raw: { type: 'multipart/form-data', body: 'recording' } },
  { name: 'recording as JSON', route: 'POST /api/recordings', as: 'technician', json: { recording: 'UklGRg==' } },
  // staff documents
  { name: 'floor tag for a piano id that is not a number', route: 'GET /api/pianos/:id/floor-tag.pdf', url: '/api/pianos/abc/floor-tag.pdf', as: 'floor' },
  { name: 'floor tag for a piano id of -1', route: 'GET /api/pianos/:id/floor-tag.pdf', url: '/api/pianos/-1/floor-tag.pdf', as: 'floor' },
  { name: 'floor tag for a piano id past the integer range', route: 'GET /api/pianos/:id/floor-tag.pdf', url: '/api/pianos/99999999999/floor-tag.pdf', as: 'floor' },
  { name: 'floor tag for a piano that does not exist', route: 'GET /api/pianos/:id/floor-tag.pdf', url: '/api/pianos/999999/floor-tag.pdf', as: 'floor' },
  { name: 'floor tag by a technician', route: 'GET /api/pianos/:id/floor-tag.pdf', url: '/api/pianos/{pianoId}/floor-tag.pdf', as: 'technician' },
  { name: 'floor tag without a sign-in', route: 'GET /api/pianos/:id/floor-tag.pdf', url: '/api/pianos/{pianoId}/floor-tag.pdf' },
  { name: 'floor tag with a token that is not one', route: 'GET /api/pianos/:id/floor-tag.pdf', url: '/api/pianos/{pianoId}/floor-tag.pdf', headers: { Authorization: 'Bearer not.a.token' } },
  { name: 'signed copy for an acknowledgement id of 1e309', route: 'GET /api/acknowledgements/:id/signed.pdf', url: '/api/acknowledgements/1e309/signed.pdf', as: 'floor' },
  { name: 'signed copy for an acknowledgement id of 0x10', route: 'GET /api/acknowledgements/:id/signed.pdf', url: '/api/acknowledgements/0x10/signed.pdf', as: 'manager' },
  { name: 'signed copy that does not exist', route: 'GET /api/acknowledgements/:id/signed.pdf', url: '/api/acknowledgements/424242/signed.pdf', as: 'manager' },
  { name: 'signed copy by intake staff', route: 'GET /api/acknowledgements/:id/signed.pdf', url: '/api/acknowledgements/1/signed.pdf', as: 'intake' },
  // the demo inbox
  { name: 'demo inbox through a proxy', route: 'GET /dev/inbox', headers: { 'X-Forwarded-For': '203.0.113.9' } },
  { name: 'demo inbox list through a proxy, as floor staff', route: 'GET /dev/inbox.json', as: 'floor', headers: { 'X-Forwarded-For': '203.0.113.9' } },
  { name: 'demo inbox list through a Forwarded header', route: 'GET /dev/inbox.json', headers: { Forwarded: 'for=203.0.113.9' } },
  { name: 'inbox attachment of an unknown message', route: 'GET /dev/inbox/:id/attachments/:n', url: '/dev/inbox/nope/attachments/0' },
  { name: 'inbox attachment number that is not one', route: 'GET /dev/inbox/:id/attachments/:n', url: '/dev/inbox/{messageId}/attachments/abc' },
  { name: 'inbox attachment number past the integer range', route: 'GET /dev/inbox/:id/attachments/:n', url: '/dev/inbox/{messageId}/attachments/99999999999' },
  { name: 'inbox attachment that is not there', route: 'GET /dev/inbox/:id/attachments/:n', url: '/dev/inbox/{messageId}/attachments/7' },
  // the stock table's CSV export
  { name: 'stock export without a sign-in', route: 'GET /api/stock/export.csv' },
  { name: 'stock export by a technician', route: 'GET /api/stock/export.csv', as: 'technician' },
  { name: 'stock export by floor staff', route: 'GET /api/stock/export.csv', as: 'floor' },
  { name: 'stock export by intake staff', route: 'GET /api/stock/export.csv', as: 'intake' },
  { name: 'stock export of an unknown stage', route: 'GET /api/stock/export.csv', url: '/api/stock/export.csv?stages=in_attic', as: 'manager' },
  { name: 'stock export by an unknown column', route: 'GET /api/stock/export.csv', url: '/api/stock/export.csv?sort=colour', as: 'manager' },
  { name: 'stock export with an unknown filter', route: 'GET /api/stock/export.csv', url: '/api/stock/export.csv?price=1', as: 'manager' },
  { name: 'stock export with a filter given twice', route: 'GET /api/stock/export.csv', url: '/api/stock/export.csv?kinds=grand&kinds=upright', as: 'manager' },
  { name: 'stock export with a filter as an object', route: 'GET /api/stock/export.csv', url: '/api/stock/export.csv?search[a]=1', as: 'manager' },
  { name: 'stock export with a NUL in the search', route: 'GET /api/stock/export.csv', url: '/api/stock/export.csv?search=ab%00c', as: 'manager' },
  { name: 'stock export with a search of 2 KB', route: 'GET /api/stock/export.csv', url: `/api/stock/export.csv?search=${'y'.repeat(2048)}`, as: 'manager' },
  { name: 'stock export descending of maybe', route: 'GET /api/stock/export.csv', url: '/api/stock/export.csv?descending=maybe', as: 'manager' },
  { name: 'stock export with a token that is not one', route: 'GET /api/stock/export.csv', headers: { Authorization: 'Bearer not.a.token' } },
  // routes that are not there
  { name: 'an API route that does not exist', route: NO_ROUTE, url: '/api/nothing-here', as: 'manager' },
  { name: 'an API route that does not exist, without a sign-in', route: NO_ROUTE, url: '/api/pianos/1/floor-tag.png' },
];

// GraphQL: wrong types, out-of-range numbers, huge strings, NUL bytes, negative ids, unknown enums,
// missing fields, wrong roles, and documents refused before they run.
const graph = (name: string, as: Role | undefined, query: string, variables?: Record<string, unknown>): BadRequest => ({ name: `GraphQL: ${name}`, route: 'POST /graphql', as, gql: { query, variables } });

const graphql: BadRequest[] = [
  graph('no sign-in', undefined, '{ me { id } }'),
  graph('no query', 'manager', ''),
  graph('recordings with neither piano nor draft', 'technician', '{ toneRecordings(where: {}) { id } }'),
  graph('recordings of a piano id past the integer range', 'technician', '{ toneRecordings(where: { pianoId: 99999999999 }) { id } }'),
  graph('recordings of a draft key with a NUL', 'technician', 'query ($k: String) { toneRecordings(where: { draftKey: $k }) { id } }', { k: NUL }),
  graph('discard a recording that is not there', 'technician', 'mutation { discardToneRecording(input: { id: 987654 }) { id } }'),
  graph('discard a recording with a negative id', 'technician', 'mutation { discardToneRecording(input: { id: -1 }) { id } }'),
  graph('a syntax error', 'manager', '{ pianos { id '),
  graph('an unknown field', 'manager', '{ pianos { id sellerName } }'),
  graph('variables of an array', 'manager', '{ me { id } }', [1] as never),
  graph('a limit of 0', 'manager', '{ pianos(limit: 0) { id } }'),
  graph('a limit of 201', 'manager', '{ pianos(limit: 201) { id } }'),
  graph('a negative offset', 'manager', '{ pianos(offset: -1) { id } }'),
  graph('a range backwards', 'manager', '{ pianos(range: [5, 1]) { id } }'),
  graph('an id of a string', 'manager', '{ piano(idEq: "abc") { id } }'),
  graph('an id past the integer range', 'manager', '{ stageHistory(pianoId: 99999999999) }'),
  graph('a variable of the wrong type', 'manager', 'query($id: Int) { piano(idEq: $id) { id } }', { id: 'abc' }),
  graph('an unknown stage', 'manager', '{ pianos(stageEq: flying) { id } }'),
  graph('a NUL in a filter', 'manager', '{ pianos(makerLikeNoCase: "Ab\\u0000rams") { id } }'),
  graph('a LIKE pattern ending in its escape', 'manager', 'query($m: String) { pianos(makerLikeNoCase: $m) { id } }', { m: '%\\' }),
  graph('a filter the list does not offer', 'manager', '{ pianos(createdAtGt: "the day before the fire") { id } }'),
  graph('a filter over 100 KB', 'manager', 'query($m: String) { pianos(makerLikeNoCase: $m) { id } }', { m: HUGE }),
  graph('3,500 aliases', 'manager', `{${Array.from({ length: 3500 }, (_, i) => `a${i}:pianos(limit:200){id}`).join(' ')}}`),
  graph('a fragment cycle', 'manager', '{ me { ...A } } fragment A on Users { id ...B } fragment B on Users { name ...A }'),
  graph('lists multiplied past the cost', 'manager', `{ ${['a', 'b', 'c', 'd'].map((a) => `${a}: pianos(limit: 200) { id stockNumber maker model serialNumber year kind sizeCm finish stage stageChangedAt createdAt updatedAt createdBy { id name } }`).join(' ')} }`),
  graph('grading rules without their required fields', 'manager', 'mutation($x: Float!) { setGradeRules(rules: { keySidePlayNormalMm: $x }) }', { x: 1 }),
  graph('a missing required argument', 'manager', '{ stageHistory }'),
  graph('history of a negative piano id', 'manager', '{ stageHistory(pianoId: -1) }'),
  graph('the intake of a piano id written as a string', 'floor', '{ intake(pianoId: "{pianoId}") }'),
  graph('the team, as a technician', 'technician', '{ team { id email } }'),
  graph('a work item of id 0', 'technician', '{ workItemDetail(itemId: 0) }'),
  graph('a piano with a NUL in the maker', 'intake', 'mutation { createPiano(maker: "Ab\\u0000rams", kind: "upright") { id } }'),
  graph('a piano of an unknown kind', 'intake', 'mutation { createPiano(maker: "Almsbury", kind: "spinet-ish") { id } }'),
  graph('a piano of a year 3000', 'intake', 'mutation { createPiano(maker: "Almsbury", kind: "upright", year: 3000) { id } }'),
  graph('a piano with a maker of 120 KB', 'intake', 'mutation($m: String!) { createPiano(maker: $m, kind: "upright") { id } }', { m: HUGE }),
  graph('a piano with a year of a float', 'intake', 'mutation { createPiano(maker: "Almsbury", kind: "upright", year: 1970.5) { id } }'),
  graph('a piano by floor staff', 'floor', 'mutation { createPiano(maker: "Almsbury", kind: "upright") { id } }'),
  graph('an unknown stage move', 'manager', 'mutation { movePiano(pianoId: {pianoId}, action: "teleport") { id } }'),
  graph('a move with a NUL in why', 'manager', 'mutation { movePiano(pianoId: {pianoId}, action: "sell", why: "x\\u0000") { id } }'),
  graph('a sale of a piano that does not exist', 'manager', 'mutation { recordSale(pianoId: 424242) }'),
  graph('a sale by a technician', 'technician', 'mutation { recordSale(pianoId: {pianoId}) }'),
  graph('a sale at a price of zero', 'manager', 'mutation($s: SaleInput) { recordSale(pianoId: {pianoId}, sale: $s) { stage } }', { s: { buyer: { name: 'Ida Fenn' }, agreedPriceMinor: 0 } }),
  graph('a sale with a negative trade-in allowance', 'manager', 'mutation($s: SaleInput) { recordSale(pianoId: {pianoId}, sale: $s) { stage } }', {
    s: { buyer: { name: 'Ida Fenn' }, agreedPriceMinor: 1000, tradeIn: { piano: { maker: 'Almsbury', kind: 'upright' }, allowanceMinor: -1 } },
  }),
  graph('a sale to a buyer with a NUL in the name', 'manager', 'mutation($s: SaleInput) { recordSale(pianoId: {pianoId}, sale: $s) { stage } }', { s: { buyer: { name: NUL }, agreedPriceMinor: 1000 } }),
  graph('the balance of a sale that does not exist', 'manager', 'mutation { markBalancePaid(saleId: 424242) { id } }'),
  graph('the balance marked paid by a technician', 'technician', 'mutation { markBalancePaid(saleId: 1) { id } }'),
  graph('the balance of a sale id written as a string', 'floor', 'mutation { markBalancePaid(saleId: "1") { id } }'),
  graph('a sale whose input is a string', 'manager', 'mutation { recordSale(pianoId: {pianoId}, sale: "paid") { stage } }'),
  graph('an intake with nothing in it', 'intake', 'mutation($i: IntakeInput!) { submitIntake(input: $i) }', { i: {} }),
  graph('an intake of a string', 'intake', 'mutation { submitIntake(input: "everything") }'),
  graph('a correction without its note', 'intake', 'mutation($i: CorrectionInput!) { correctAssessment(input: $i) }', { i: { pianoId: 1, measurements: {} } }),
  graph('grading rules of junk', 'manager', 'mutation($r: GradeRulesInput!) { setGradeRules(rules: $r) }', { r: { thresholds: 'high' } }),
  graph('grading rules by intake staff', 'intake', 'mutation($r: GradeRulesInput!) { setGradeRules(rules: $r) }', { r: {} }),
  graph('a user with an unknown role', 'manager', 'mutation { createUser(email: "new@feltwire.test", name: "New Person", role: "owner", password: "long-enough-1") { id } }'),
  graph('a user with a NUL in the name', 'manager', 'mutation { createUser(email: "new@feltwire.test", name: "Ne\\u0000w", role: "intake", password: "long-enough-1") { id } }'),
  graph('a user with a short password', 'manager', 'mutation { createUser(email: "new@feltwire.test", name: "New Person", role: "intake", password: "short") { id } }'),
  graph('a user by floor staff', 'floor', 'mutation { createUser(email: "new@feltwire.test", name: "New Person", role: "intake", password: "long-enough-1") { id } }'),
  graph('a role change to an unknown role', 'manager', 'mutation { changeUserRole(userId: 1, role: "owner") { id } }'),
  graph('deactivating a user that does not exist', 'manager', 'mutation { setUserActive(userId: 424242, active: false) { id } }'),
  graph('a negative asking price', 'manager', 'mutation($i: AskingPriceInput!) { setAskingPrice(input: $i) { id } }', { i: { pianoId: 1, askingPriceMinor: -5, currency: 'USD' } }),
  graph('an asking price in an unknown currency', 'manager', 'mutation($i: AskingPriceInput!) { setAskingPrice(input: $i) { id } }', { i: { pianoId: 1, askingPriceMinor: 100, currency: 'XTS' } }),
  graph('shop texts of 120 KB', 'manager', 'mutation($t: ShopTextsInput!) { setShopTexts(texts: $t) }', { t: { dealerName: 'x', warranty: HUGE } }),
  graph('shop texts with a NUL', 'manager', 'mutation($t: ShopTextsInput!) { setShopTexts(texts: $t) }', { t: { dealerName: NUL, warranty: 'One year.' } }),
  graph('publishing by a technician', 'technician', 'mutation { publishDisclosure(pianoId: {pianoId}) }'),
  graph('countersigning what does not exist', 'floor', 'mutation { countersign(acknowledgementId: 424242) }'),
  graph('a work item of an unknown task', 'manager', 'mutation($i: WorkItemInput!) { addWorkItem(pianoId: {pianoId}, item: $i) }', { i: { task: 'polish_the_moon', estimatedHours: 1 } }),
  graph('a work item patch of junk', 'manager', 'mutation($p: WorkItemPatch!) { updateWorkItem(itemId: 1, patch: $p) }', { p: { estimatedHours: -4 } }),
  graph('removing a work item that does not exist', 'manager', 'mutation { removeWorkItem(itemId: 424242) }'),
  graph('a timer on a work item that does not exist', 'technician', 'mutation { startTimer(itemId: 424242) }'),
  graph('stopping a timer never started', 'technician', 'mutation { stopTimer(itemId: 424242) }'),
  graph('time of 0 minutes', 'technician', 'mutation($e: TimeEntryInput!) { logTime(entry: $e) }', { e: { workItemId: 1, minutes: 0 } }),
  graph('a part with a NUL', 'technician', 'mutation($p: PartUseInput!) { addPart(part: $p) }', { p: { workItemId: 1, description: NUL, costMinor: 100 } }),
  graph('a work note with a NUL', 'technician', 'mutation { addWorkNote(itemId: 1, body: "a\\u0000b") }'),
  graph('a work item marked done by floor staff', 'floor', 'mutation { setWorkItemDone(itemId: 1, done: true) }'),
  graph('a re-measurement of junk', 'technician', 'mutation($i: RemeasureInput!) { submitRemeasurement(input: $i) }', { i: { pianoId: 'one' } }),
  graph('finishing the workshop for a piano that does not exist', 'manager', 'mutation { finishWorkshop(pianoId: 424242) { id } }'),
  graph('approving a plan for a piano id of -1', 'manager', 'mutation { approvePlan(pianoId: -1) { id } }'),
  graph('an unknown decision', 'manager', 'mutation { decidePiano(pianoId: {pianoId}, decision: "burn") }'),
  graph('a climate reading of 500 % humidity', 'technician', 'mutation($r: JSON) { logClimate(reading: $r) }', { r: { relativeHumidityPct: 500, temperatureC: 20 } }),
  graph('a rate card of junk', 'manager', 'mutation($c: JSON) { setRateCard(card: $c) }', { c: { hourlyRateMinor: 'lots' } }),
  graph('releasing a hold as floor staff', 'floor', 'mutation { releaseHold(depositId: 1, refund: true) }'),
  graph('refunding a deposit that does not exist', 'manager', 'mutation { refundDeposit(depositId: 424242) }'),
  graph('deposit rules of 200 %', 'manager', 'mutation($r: DepositRulesInput!) { setDepositRules(rules: $r) }', { r: { percent: 200, minimumMajor: 0, holdDays: 7, salesTaxPct: 0 } }),
  graph('an offer for a piano id past the integer range', 'intake', '{ pianoMoney(pianoId: 99999999999) { offer { status } } }'),
  graph('the cost basis by a technician', 'technician', '{ pianoMoney(pianoId: {pianoId}) { costBasisMinor marginMinor allowanceMinor } }'),
  graph('an answer to an offer with an unknown answer', 'intake', 'mutation { recordOfferAnswer(input: { pianoId: {pianoId}, answer: maybe, offeredMinor: 100 }) { id } }'),
  graph('an answer to an offer of another figure', 'intake', 'mutation { recordOfferAnswer(input: { pianoId: {pianoId}, answer: accepted, offeredMinor: 1 }) { id } }'),
  graph('a counter-offer with a NUL in the note', 'intake', 'mutation($n: String) { recordOfferAnswer(input: { pianoId: {pianoId}, answer: countered, offeredMinor: 1, counterMinor: 5, note: $n }) { id } }', { n: NUL }),
  graph('an answer to an offer by floor staff', 'floor', 'mutation { recordOfferAnswer(input: { pianoId: {pianoId}, answer: declined, offeredMinor: 1 }) { id } }'),
  graph('an answer to an offer on a piano that does not exist', 'intake', 'mutation { recordOfferAnswer(input: { pianoId: 424242, answer: declined, offeredMinor: 1 }) { id } }'),
  graph('an asking price with a reason of 120 KB', 'manager', 'mutation($r: String!) { changeAskingPrice(input: { pianoId: {pianoId}, askingPriceMinor: 100, currency: "USD", reason: $r }) { pianoId } }', { r: HUGE }),
  graph('an asking price past the integer range', 'manager', 'mutation { changeAskingPrice(input: { pianoId: {pianoId}, askingPriceMinor: 99999999999, currency: "USD", reason: "why not" }) { pianoId } }'),
  graph('an asking price by floor staff', 'floor', 'mutation { changeAskingPrice(input: { pianoId: {pianoId}, askingPriceMinor: 100, currency: "USD", reason: "cheaper" }) { pianoId } }'),
  graph('the stock table of 1000 rows', 'manager', '{ stockTable(query: { limit: 1000 }) { total } }'),
  graph('the stock table by an unknown column', 'manager', '{ stockTable(query: { sort: colour }) { total } }'),
  graph('the stock table of an unknown readiness', 'manager', '{ stockTable(query: { readiness: ["splendid"] }) { total } }'),
  graph('the stock table at a negative offset', 'manager', '{ stockTable(query: { offset: -1 }) { total } }'),
  graph('the stock table by a technician', 'technician', '{ stockTable { rows { marginMinor } } }'),
  graph('the stock charts by floor staff', 'floor', '{ stockCharts { margins { value } } }'),
  graph('pricing rules with a margin of 150 %', 'manager', 'mutation($r: PricingRulesInput!) { setPricingRules(rules: $r) { version } }', { r: { targetMargin: 1.5 } }),
  graph('pricing rules by intake staff', 'intake', '{ pricingRules { targetMargin } }'),
  graph('a mutation over GET', 'manager', 'mutation { removeWorkItem(itemId: 1) }'),
];
// The one request sent by GET: a mutation, which GraphQL over HTTP refuses there.
graphql[graphql.length - 1] = { ...graphql[graphql.length - 1], route: 'GET /graphql', url: `/graphql?query=${encodeURIComponent('mutation { removeWorkItem(itemId: 1) }')}` };

export const BAD_REQUESTS: BadRequest[] = [
  ...rest,
  ...graphql,
  { name: 'GraphQL as text/plain', route: 'POST /graphql', as: 'manager', raw: { type: 'text/plain', body: '{"query":"{ me { id } }"}' } },
  { name: 'GraphQL over 100 KB', route: 'POST /graphql', as: 'manager', json: { query: `{ me { id } } # ${HUGE}` } },
  { name: 'GraphQL with JSON that ends early', route: 'POST /graphql', as: 'manager', raw: { type: 'application/json', body: '{"query":' } },
  { name: 'GraphQL with a body of a string', route: 'POST /graphql', as: 'manager', raw: { type: 'application/json', body: '"{ me { id } }"' } },
  { name: 'GraphQL asking for XML', route: 'POST /graphql', as: 'manager', headers: { Accept: 'application/xml' }, json: { query: '{ me { id } }' } },
  { name: 'GraphQL with DELETE', route: NO_ROUTE, url: '/graphql', as: 'manager' },
  { name: 'GraphQL GET without a query', route: 'GET /graphql', as: 'manager' },
];
