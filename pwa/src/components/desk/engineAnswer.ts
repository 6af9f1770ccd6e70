import { EngineInputError } from '../../engine';

export type EngineAnswer<T> = { value: T } | { error: string; field: string };

/**
 * Runs engine maths on what is typed right now: an input the engine refuses becomes a message
 * for the screen, naming the field, instead of an exception. Other errors are bugs and pass on.
 */
export function engineAnswer<T>(run: () => T): EngineAnswer<T> {
  try {
    return { value: run() };
  } catch (error) {
    if (error instanceof EngineInputError)
      return { error: `${error.field}: ${error.reason}`, field: error.field };
    throw error;
  }
}
