import { useCallback, useSyncExternalStore } from 'react';
import type { FormulaDraft } from './reviewFormula';

/** A formula the engineer kept, to fit to compounds like a built-in model. */
export interface SavedFormula {
  name: string;
  energy: string;
  constants: Record<string, number>;
}

// Kept in this browser: a formula is a working tool of one engineer until a fit made with it
// is published, and then the fit itself carries the energy and constants to the server.
const KEY = 'gumshoe.desk.formulas';
const listeners = new Set<() => void>();
let cache: { raw: string | null; list: SavedFormula[] } = { raw: null, list: [] };

function read(): SavedFormula[] {
  const raw = localStorage.getItem(KEY);
  if (raw !== cache.raw) {
    let list: SavedFormula[] = [];
    try {
      const parsed: unknown = raw ? JSON.parse(raw) : [];
      if (Array.isArray(parsed)) list = parsed as SavedFormula[];
    } catch {
      list = [];
    }
    cache = { raw, list };
  }
  return cache.list;
}

function write(list: SavedFormula[]) {
  localStorage.setItem(KEY, JSON.stringify(list));
  listeners.forEach((listener) => listener());
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function draftFromSaved(saved: SavedFormula): FormulaDraft {
  return {
    name: saved.name,
    energy: saved.energy,
    constants: Object.entries(saved.constants).map(([name, value]) => ({
      name,
      value: String(value),
    })),
  };
}

export function useFormulaLibrary() {
  const formulas = useSyncExternalStore(subscribe, read);
  const save = useCallback((formula: SavedFormula) => {
    write([...read().filter((f) => f.name !== formula.name), formula]);
  }, []);
  const remove = useCallback((name: string) => write(read().filter((f) => f.name !== name)), []);
  return { formulas, save, remove };
}
