import { runFitJob, type FitJob, type FitOutcome } from './fitJob';

let worker: Worker | null = null;
let nextId = 0;
const waiting = new Map<number, (outcome: FitOutcome) => void>();

function fitWorker(): Worker | null {
  if (typeof Worker === 'undefined') return null;
  if (!worker) {
    worker = new Worker(new URL('./fit.worker.ts', import.meta.url), { type: 'module' });
    worker.onmessage = (event: MessageEvent<FitOutcome & { id: number }>) => {
      const { id, ...outcome } = event.data;
      waiting.get(id)?.(outcome);
      waiting.delete(id);
    };
    // A worker that dies answers every fit still waiting, so no button stays busy for ever.
    worker.onerror = (event) => {
      for (const resolve of waiting.values())
        resolve({ label: '', error: event.message || 'the fit stopped' });
      waiting.clear();
      worker = null;
    };
  }
  return worker;
}

/** Runs the fits off the main thread where the browser can (tests run them in place). */
export function runFits(jobs: FitJob[]): Promise<FitOutcome[]> {
  const target = fitWorker();
  if (!target) return Promise.resolve(jobs.map(runFitJob));
  return Promise.all(
    jobs.map(
      (job) =>
        new Promise<FitOutcome>((resolve) => {
          const id = nextId++;
          waiting.set(id, (outcome) => resolve({ ...outcome, label: job.label }));
          target.postMessage({ id, ...job });
        }),
    ),
  );
}
