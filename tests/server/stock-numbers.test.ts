import { startTestApi, type TestApi } from '../support/api';

let api: TestApi;
beforeAll(async () => {
  api = await startTestApi();
});
afterAll(() => api.close());

it('numbers the 10,000th piano and after with as many digits as they need, never again FW-1000', async () => {
  await api.knex.raw(`select setval('piano_stock_seq', 9998)`);
  const token = await api.tokenFor('intake');
  const made = [];
  for (let i = 0; i < 3; i += 1) {
    const res = await api.gql(token, 'mutation { createPiano(maker: "Ostermere", kind: "upright") { stockNumber } }');
    expect(res.body.errors).toBeUndefined();
    made.push(res.body.data.createPiano.stockNumber);
  }
  expect(made).toEqual(['FW-9999', 'FW-10000', 'FW-10001']);
});
