import { useEffect, useState } from 'react';

export type Engine = typeof import('../engine/index');

let loaded: Engine | undefined;
let loading: Promise<Engine> | undefined;

/**
 * The engine (and mathjs, which its formula models need) is fetched on first use, not with
 * the app: the inspector's first screen must stay small. The service worker precaches the
 * chunk, so this works offline too.
 */
export function loadEngine(): Promise<Engine> {
  loading ??= import('../engine/index').then((engine) => (loaded = engine));
  return loading;
}

/** The engine once it has arrived; undefined for the first moment on a cold start. */
export function useEngine(): Engine | undefined {
  const [engine, setEngine] = useState(loaded);
  useEffect(() => {
    if (engine) return;
    let live = true;
    void loadEngine().then((arrived) => live && setEngine(arrived));
    return () => {
      live = false;
    };
  }, [engine]);
  return engine;
}
