import type { VerdictStatus } from '../../engine/index';
import './standing.css';

const WORDS: Record<VerdictStatus, string> = {
  within: 'Within',
  near: 'Near the limit',
  out: 'Out',
};

/** Colour and a word, never colour alone: readable in glare and by the colour-blind. */
export function StandingBadge({ standing }: { standing: VerdictStatus }) {
  return (
    <span className={`standing standing-${standing}`} data-standing={standing}>
      {WORDS[standing]}
    </span>
  );
}
