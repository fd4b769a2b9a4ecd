/// <reference lib="webworker" />
import { runJob, type UncertaintyJob } from './uncertaintyJob.ts';

// The Monte Carlo runs here, off the page's thread; a new job supersedes the one running.
let current = -1;
self.onmessage = (event: MessageEvent<{ job: UncertaintyJob; slice?: number } | { cancel: true }>) => {
  if ('cancel' in event.data) { current = -1; return; }
  const { job, slice } = event.data;
  current = job.id;
  void runJob(job, (m) => self.postMessage(m), () => current === job.id, slice);
};
