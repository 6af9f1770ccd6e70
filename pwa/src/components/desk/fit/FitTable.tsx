import { MODES, type FitResult, type StopReason } from '../../../engine';
import { formatNumber } from '../format';
import { constantUnit, modelConstants } from '../modelNames';
import type { FitOutcome } from './fitJob';

const STOP_WORDS: Record<StopReason, string> = {
  ftol: 'cost stopped falling (ftol)',
  xtol: 'constants stopped moving (xtol)',
  'ftol+xtol': 'cost and constants settled (ftol, xtol)',
  gtol: 'gradient vanished (gtol)',
  'max-evaluations': 'gave up at the evaluation limit',
  rounding: 'reached rounding precision',
};

function Constants({ result }: { result: FitResult }) {
  return (
    <span className="desk-code">
      {modelConstants(result.model)
        .map(([name, value]) => `${name} = ${formatNumber(value, 5)}${constantUnit(name)}`)
        .join(', ')}
    </span>
  );
}

/** Constants, goodness of fit per mode, moduli and how the search ended, one row per model. */
export function FitTable({ outcomes }: { outcomes: FitOutcome[] }) {
  return (
    <div className="desk-scroll">
      <table className="desk-table" aria-label="Fit results">
        <thead>
          <tr>
            <th scope="col">model</th>
            <th scope="col">constants</th>
            {MODES.map((mode) => (
              <th key={mode} scope="col" className="num">
                {mode} RMS, MPa / R²
              </th>
            ))}
            <th scope="col" className="num">
              μ₀, MPa
            </th>
            <th scope="col" className="num">
              E₀, MPa
            </th>
            <th scope="col" className="num">
              iterations
            </th>
            <th scope="col">stopped because</th>
          </tr>
        </thead>
        <tbody>
          {outcomes.map((outcome) =>
            'error' in outcome ? (
              <tr key={outcome.label}>
                <td>{outcome.label}</td>
                <td colSpan={8} className="desk-problem">
                  no fit: {outcome.error}
                </td>
              </tr>
            ) : (
              <tr key={outcome.label}>
                <td>{outcome.label}</td>
                <td>
                  <Constants result={outcome.result} />
                </td>
                {MODES.map((mode) => (
                  <td key={mode} className="num">
                    {outcome.result.rmsByMode[mode] === undefined
                      ? '–'
                      : `${formatNumber(outcome.result.rmsByMode[mode], 3)} / ${formatNumber(outcome.result.r2ByMode[mode], 4)}`}
                  </td>
                ))}
                <td className="num">{formatNumber(outcome.result.mu0)}</td>
                <td className="num">{formatNumber(outcome.result.e0)}</td>
                <td className="num">{outcome.result.iterations}</td>
                <td>{STOP_WORDS[outcome.result.stopReason]}</td>
              </tr>
            ),
          )}
        </tbody>
      </table>
    </div>
  );
}
