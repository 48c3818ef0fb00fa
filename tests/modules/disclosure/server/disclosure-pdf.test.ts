import QRCode from 'qrcode';

import { floorTagPdf, qrRuns } from '@/modules/disclosure/server/disclosure-pdf';

const URL = 'http://127.0.0.1:8080/d/AbCdEfGhIjKlMnOpQrStUvWxYz012345';

it('draws exactly the dark modules of the QR code of the link, row by row', () => {
  const { modules } = QRCode.create(URL, { errorCorrectionLevel: 'M' });
  const { size, runs } = qrRuns(URL);
  expect(size).toBe(modules.size);
  const drawn = Array.from({ length: size }, () => new Array<boolean>(size).fill(false));
  for (const [row, col, length] of runs) for (let c = col; c < col + length; c += 1) drawn[row][c] = true;
  const expected = Array.from({ length: size }, (_, r) => Array.from({ length: size }, (_, c) => !!modules.get(r, c)));
  expect(drawn).toEqual(expected);
  // Runs, not single squares: far fewer shapes than dark modules.
  expect(runs.length).toBeLessThan(expected.flat().filter(Boolean).length / 2);
});

it('puts the code on the tag as shapes, with no picture to decode', async () => {
  const pdf = (await floorTagPdf({ stockNumber: 'FW-0008', title: 'Corvelle U-125', price: 'USD 4,215.00', url: URL, dealerName: 'Larkspur Lane Pianos' })).toString('latin1');
  expect(pdf).not.toMatch(/\/Subtype\s*\/Image/);
  expect(pdf.startsWith('%PDF-')).toBe(true);
});
