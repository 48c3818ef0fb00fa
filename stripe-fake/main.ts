// `tsx stripe-fake/main.ts <port> <webhook url> <webhook secret>`: runs the payment stand-in until stopped.
import { startStripeFake } from './stripe-fake';

const [port, webhookUrl, webhookSecret] = process.argv.slice(2);
if (!port || !webhookUrl || !webhookSecret) {
  console.error('usage: tsx stripe-fake/main.ts <port> <webhook url> <webhook secret>');
  process.exit(2);
}
startStripeFake({ port: Number(port), webhookUrl, webhookSecret }).then(
  (fake) => {
    console.log(`[stripe-fake] payment API on ${fake.url}/v1, payments list on ${fake.url}/payments`);
    const stop = () => void fake.close().then(() => process.exit(0));
    process.once('SIGINT', stop);
    process.once('SIGTERM', stop);
  },
  (err) => {
    console.error('[stripe-fake] failed to start:', err);
    process.exit(1);
  },
);
