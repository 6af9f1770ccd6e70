import { useState } from 'react';
import type { NewFit } from '../../../api/desk/types';
import { PublishForm } from '../compound/PublishForm';
import type { FitOutcome } from './fitJob';

interface Props {
  outcomes: FitOutcome[];
  fitFor(outcome: Extract<FitOutcome, { result: unknown }>): NewFit;
  onSave(fit: NewFit, publishNote?: string): Promise<unknown>;
}

/** Keep a fit as a draft version, or publish it as the constants part specs take from now on. */
export function FitActions({ outcomes, fitFor, onSave }: Props) {
  const [open, setOpen] = useState<string | null>(null);
  const [done, setDone] = useState<Record<string, string>>({});
  const fitted = outcomes.filter(
    (o): o is Extract<FitOutcome, { result: unknown }> => 'result' in o,
  );

  async function save(outcome: (typeof fitted)[number], note?: string) {
    await onSave(fitFor(outcome), note);
    setDone({ ...done, [outcome.label]: note === undefined ? 'kept as a draft' : 'published' });
    setOpen(null);
  }

  return (
    <section className="desk-card" aria-label="Keep or publish">
      <h3>Keep or publish</h3>
      {fitted.map((outcome) => (
        <div key={outcome.label} className="desk-row desk-row--wrap">
          <strong style={{ minWidth: '12rem' }}>{outcome.label}</strong>
          {done[outcome.label] ? (
            <span className="desk-badge desk-badge--published">{done[outcome.label]}</span>
          ) : open === outcome.label ? (
            <PublishForm
              label={`Publish ${outcome.label} as the current constants`}
              onCancel={() => setOpen(null)}
              onPublish={(note) => save(outcome, note)}
            />
          ) : (
            <div className="desk-actions">
              <button type="button" className="desk-primary" onClick={() => setOpen(outcome.label)}>
                Publish…
              </button>
              <button type="button" onClick={() => void save(outcome)}>
                Keep as a draft
              </button>
            </div>
          )}
        </div>
      ))}
      <p className="desk-muted">
        The server fits again from these constants with the same data and settings, so the stored
        version is the one shown here.
      </p>
    </section>
  );
}
