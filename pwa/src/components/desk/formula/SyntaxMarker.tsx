/** The energy as typed with the character where reading stopped marked, like a caret under it. */
export function SyntaxMarker({ energy, position }: { energy: string; position: number }) {
  const at = Math.min(Math.max(position, 0), energy.length);
  const marked = energy.slice(at, at + 1) || ' ';
  return (
    <p className="desk-code desk-syntax" data-testid="syntax-marker">
      <span>{energy.slice(0, at)}</span>
      <mark aria-label={`character ${at + 1}`}>{marked}</mark>
      <span>{energy.slice(at + 1)}</span>
      <span className="desk-muted"> ← character {at + 1}</span>
    </p>
  );
}
