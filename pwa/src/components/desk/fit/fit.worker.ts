/// <reference lib="webworker" />
import { runFitJob, type FitJob } from './fitJob';

// Fits run here so a slow one (Ogden's several starts, a long formula) never freezes the desk.
self.onmessage = (event: MessageEvent<FitJob & { id: number }>) => {
  const { id, ...job } = event.data;
  self.postMessage({ id, ...runFitJob(job) });
};
