import { useState } from 'react';

/** One write to the server at a time: busy while it runs, and its failure as a message. */
export function useSubmission() {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function submit(action: () => Promise<unknown>) {
    setBusy(true);
    setError(null);
    try {
      await action();
    } catch (failure) {
      setError(failure instanceof Error ? failure.message : String(failure));
    } finally {
      setBusy(false);
    }
  }

  return { busy, error, submit, clearError: () => setError(null) };
}
