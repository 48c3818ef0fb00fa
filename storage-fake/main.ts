// `tsx storage-fake/main.ts <port> <directory> [bucket...]`: runs the fake until stopped.
import { startStorageFake } from './storage-fake';

const [port, directory, ...buckets] = process.argv.slice(2);
if (!port || !directory) {
  console.error('usage: tsx storage-fake/main.ts <port> <directory> [bucket...]');
  process.exit(2);
}
startStorageFake({ port: Number(port), directory, buckets }).then(
  (fake) => {
    console.log(`[storage-fake] S3 on http://127.0.0.1:${fake.port}, objects in ${directory}`);
    const stop = () => void fake.close().then(() => process.exit(0));
    process.once('SIGINT', stop);
    process.once('SIGTERM', stop);
  },
  (err) => {
    console.error('[storage-fake] failed to start:', err);
    process.exit(1);
  },
);
