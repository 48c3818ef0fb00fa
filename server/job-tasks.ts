import { expireHoldJob, refundDepositJob } from '@/modules/deposits/server/deposit-service';
import { startJobWorker, type JobHandlers, type JobWorker } from '@/modules/jobs/server/worker';

import { serviceDeps, type AppDeps } from './app';
import { sendQueuedMail } from './mail';

// Every kind of background work, wired to the services that do it.
export function jobHandlers(deps: AppDeps): JobHandlers {
  const { deposits } = serviceDeps(deps);
  return {
    'refund-deposit': (p, run) => refundDepositJob(deposits, p.depositId, p.notice, run),
    'expire-hold': (p) => expireHoldJob(deposits, p.depositId),
    'send-email': (mail) => sendQueuedMail(deps.mailer, deps.photos, mail),
  };
}

/** The job worker inside the server process. */
export function startAppJobs(deps: AppDeps, opts: { verbose?: boolean } = {}): Promise<JobWorker> {
  return startJobWorker({ knex: deps.knex, handlers: jobHandlers(deps), verbose: opts.verbose });
}
