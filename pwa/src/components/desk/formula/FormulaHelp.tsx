/** How to write an energy, in our words. */
export function FormulaHelp() {
  return (
    <details className="desk-card">
      <summary>
        <strong>How to write W(I1, I2)</strong>
      </summary>
      <p>
        Type the strain-energy density in MPa as a function of the first and second invariants{' '}
        <code>I1</code> and <code>I2</code> (both 3 when the rubber is at rest). Gumshoe works out
        every stress and stiffness from W itself, so you never derive anything by hand.
      </p>
      <ul>
        <li>
          Arithmetic: <code>+ - * / ^</code> and parentheses. A name next to a bracket multiplies:{' '}
          <code>C10 (I1 - 3)</code> is <code>C10 * (I1 - 3)</code>.
        </li>
        <li>
          Functions: <code>exp</code>, <code>log</code> (natural, also <code>ln</code>),{' '}
          <code>sqrt</code>, <code>sin</code>, <code>cos</code>, <code>sinh</code>,{' '}
          <code>cosh</code>, <code>tanh</code>, <code>coth</code>, <code>abs</code>; the numbers{' '}
          <code>pi</code> and <code>e</code>.
        </li>
        <li>
          Every other name is a constant: list it below with a starting value. A fit moves the
          values; the names stay.
        </li>
        <li>
          Keep W = 0 and its slope positive at rest; a model that softens as it stretches fails the
          stability check after a fit.
        </li>
      </ul>
      <p className="desk-muted">Examples</p>
      <ul className="desk-code">
        <li>C10 (I1 - 3) + C01 (I2 - 3) + C11 (I1 - 3) (I2 - 3)</li>
        <li>mu/(2 b) (exp(b (I1 - 3)) - 1)</li>
        <li>C10 (I1 - 3) + C20 (I1 - 3)^2 + K (sqrt(I2/3) - 1)</li>
      </ul>
    </details>
  );
}
