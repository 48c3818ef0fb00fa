import { z } from 'zod';

// zod probes for eval when a schema is built; the web app's content security policy forbids eval.
// Every schema imports z from here, so the setting comes first.
z.config({ jitless: true });

export { z };
