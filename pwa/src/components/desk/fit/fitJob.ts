import { EngineInputError, fitModel, type FitOptions, type FitResult } from '../../../engine';

export interface FitJob {
  label: string;
  options: FitOptions;
}

export type FitOutcome = { label: string; result: FitResult } | { label: string; error: string };

/** One fit; an input the engine refuses comes back as its reason rather than an exception. */
export function runFitJob({ label, options }: FitJob): FitOutcome {
  try {
    return { label, result: fitModel(options) };
  } catch (error) {
    if (error instanceof EngineInputError)
      return { label, error: `${error.field}: ${error.reason}` };
    return { label, error: error instanceof Error ? error.message : String(error) };
  }
}
