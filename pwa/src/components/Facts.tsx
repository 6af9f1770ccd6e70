/** A row of labelled facts (term, value), as at the head of a lot or a settings card. */
export function Facts({ facts, testId }: { facts: [string, string][]; testId?: string }) {
  return (
    <dl className="facts" data-testid={testId}>
      {facts.map(([term, value]) => (
        <div key={term}>
          <dt>{term}</dt>
          <dd>{value}</dd>
        </div>
      ))}
    </dl>
  );
}
