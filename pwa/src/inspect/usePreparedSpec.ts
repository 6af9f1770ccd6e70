import { useMemo } from 'react';
import type { PreparedSpec } from '../engine/index';
import type { SpecRevision } from '../api/types';
import { useEngine, type Engine } from './engine';
import { toPartSpec } from './partSpec';

export interface PreparedState {
  engine?: Engine;
  prepared?: PreparedSpec;
  /** Why this revision cannot be judged (no fit, or a spec the engine refuses). */
  problem?: string;
}

/** The engine and the spec worked out once for every part of a lot. */
export function usePreparedSpec(
  revision: Pick<SpecRevision, 'body' | 'fit' | 'partSpec'> | undefined,
): PreparedState {
  const engine = useEngine();
  return useMemo(() => {
    if (!engine || !revision) return { engine };
    const spec = toPartSpec(revision);
    if (!spec)
      return { engine, problem: 'This revision has no fitted compound, so no expected load.' };
    try {
      return { engine, prepared: engine.prepareSpec(spec) };
    } catch (error) {
      return {
        engine,
        problem:
          error instanceof engine.EngineInputError
            ? `${error.field}: ${error.reason}`
            : String(error),
      };
    }
  }, [engine, revision]);
}
