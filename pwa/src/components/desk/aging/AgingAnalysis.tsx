import { useId, useState } from 'react';
import {
  arrheniusLife,
  expectedCompressionSet,
  highestTemperatureForLife,
  type AgingPoint,
  type ArrheniusFit,
} from '../../../engine';
import { formatNumber } from '../format';
import { engineAnswer } from '../engineAnswer';
import { ArrheniusChart } from './ArrheniusChart';

/**
 * Common practice, not a standard's number: beyond about 25 K outside the tested temperatures an
 * Arrhenius line is a guess, because another aging mechanism may take over.
 */
const LONG_EXTRAPOLATION_K = 25;

export interface SetCondition {
  temperatureC: number;
  hours: number;
  limitPercent?: number;
}

interface Props {
  points: AgingPoint[];
  fit: ArrheniusFit;
  thresholdPercent: number;
  condition?: SetCondition;
}

function ExtrapolationNote({ kelvin }: { kelvin: number }) {
  if (kelvin <= 0) return null;
  const long = kelvin > LONG_EXTRAPOLATION_K;
  return (
    <p
      className={`desk-callout ${long ? 'desk-callout--error' : 'desk-callout--warn'}`}
      role={long ? 'alert' : undefined}
    >
      {long ? 'Long extrapolation: ' : 'Extrapolated: '}
      {formatNumber(kelvin, 3)} K outside the tested temperatures.
      {long && ' Treat this as a rough guess and confirm with an oven test nearer the condition.'}
    </p>
  );
}

function NumberInput(props: { label: string; value: string; onChange(v: string): void }) {
  const id = useId();
  return (
    <div className="desk-field">
      <label htmlFor={id}>{props.label}</label>
      <input
        id={id}
        inputMode="decimal"
        value={props.value}
        onChange={(e) => props.onChange(e.target.value)}
      />
    </div>
  );
}

function ExpectedSet({
  fit,
  thresholdPercent,
  initial,
}: {
  fit: ArrheniusFit;
  thresholdPercent: number;
  initial?: SetCondition;
}) {
  const [temperature, setTemperature] = useState(String(initial?.temperatureC ?? 70));
  const [hours, setHours] = useState(String(initial?.hours ?? 22));
  const [limit, setLimit] = useState(
    initial?.limitPercent === undefined ? '' : String(initial.limitPercent),
  );
  const answer = engineAnswer(() => {
    const condition = { thresholdPercent, temperatureC: Number(temperature), hours: Number(hours) };
    return {
      set: expectedCompressionSet(fit, condition),
      life: arrheniusLife(fit, condition.temperatureC),
    };
  });
  const limitValue = limit.trim() === '' ? null : Number(limit);
  return (
    <section className="desk-card" aria-label="Expected set">
      <h3>Expected compression set at a condition</h3>
      <div className="desk-grid desk-grid--4">
        <NumberInput label="temperature, °C" value={temperature} onChange={setTemperature} />
        <NumberInput label="time, h" value={hours} onChange={setHours} />
        <NumberInput label="set limit, % (optional)" value={limit} onChange={setLimit} />
      </div>
      {'error' in answer ? (
        <p className="desk-callout desk-callout--error">{answer.error}</p>
      ) : (
        <>
          <p>
            Expected set{' '}
            <strong data-testid="expected-set">{formatNumber(answer.value.set, 3)} %</strong> after{' '}
            {hours} h at {temperature} °C
            {limitValue !== null && Number.isFinite(limitValue) && (
              <>
                {' '}
                against the limit {formatNumber(limitValue, 3)} %:{' '}
                <span
                  className={`desk-badge desk-badge--${answer.value.set <= limitValue ? 'within' : 'out'}`}
                >
                  {answer.value.set <= limitValue ? 'inside the limit' : 'over the limit'}
                </span>
              </>
            )}
          </p>
          <p className="desk-muted">
            From first-order set growth through the threshold time at that temperature,{' '}
            {formatNumber(answer.value.life.hours, 3)} h (band{' '}
            {formatNumber(answer.value.life.lowHours, 3)}–
            {formatNumber(answer.value.life.highHours, 3)} h).
          </p>
          <ExtrapolationNote kelvin={answer.value.life.extrapolationK} />
        </>
      )}
    </section>
  );
}

function HighestTemperature({ fit }: { fit: ArrheniusFit }) {
  const [hours, setHours] = useState('10000');
  const answer = engineAnswer(() => {
    const temperatureC = highestTemperatureForLife(fit, Number(hours));
    return { temperatureC, life: arrheniusLife(fit, temperatureC) };
  });
  return (
    <section className="desk-card" aria-label="Highest temperature">
      <h3>Highest temperature for a required life</h3>
      <div className="desk-grid desk-grid--4">
        <NumberInput label="required life, h" value={hours} onChange={setHours} />
      </div>
      {'error' in answer ? (
        <p className="desk-callout desk-callout--error">{answer.error}</p>
      ) : (
        <>
          <p>
            Up to{' '}
            <strong data-testid="highest-temperature">
              {formatNumber(answer.value.temperatureC, 3)} °C
            </strong>{' '}
            the fitted line reaches {hours} h. At that temperature the band of the life is{' '}
            {formatNumber(answer.value.life.lowHours, 3)}–
            {formatNumber(answer.value.life.highHours, 3)} h; plan on the low end.
          </p>
          <ExtrapolationNote kelvin={answer.value.life.extrapolationK} />
        </>
      )}
    </section>
  );
}

/** The Arrhenius fit of one aging series and what it predicts (ISO 11346). */
export function AgingAnalysis({ points, fit, thresholdPercent, condition }: Props) {
  const band = fit.activationEnergyBandKJ;
  return (
    <>
      <section className="desk-card" aria-label="Arrhenius fit">
        <h3>Arrhenius fit, ln t = a + b/T</h3>
        <div className="desk-stats">
          <div className="desk-stat">
            activation energy Ea{' '}
            <strong data-testid="activation-energy">
              {formatNumber(fit.activationEnergyKJ)} kJ/mol
            </strong>
          </div>
          <div className="desk-stat">
            {Math.round(fit.confidence * 100)} % band of Ea
            <strong>
              {formatNumber(band.low)} – {formatNumber(band.high)}
            </strong>
          </div>
          <div className="desk-stat">
            R² <strong>{formatNumber(fit.r2, 5)}</strong>
          </div>
          <div className="desk-stat">
            a, b{' '}
            <strong>
              {formatNumber(fit.a)}, {formatNumber(fit.b)} K
            </strong>
          </div>
          <div className="desk-stat">
            tested{' '}
            <strong>
              {formatNumber(fit.testedRangeC.min, 3)} – {formatNumber(fit.testedRangeC.max, 3)} °C
            </strong>
          </div>
        </div>
        <p className="desk-muted">
          Activation energies for one compound differ widely between laboratories, so read every
          prediction below with its band.
        </p>
        <ArrheniusChart
          points={points}
          fit={fit}
          extendToC={condition ? [condition.temperatureC] : []}
        />
      </section>
      <div className="desk-split">
        <ExpectedSet fit={fit} thresholdPercent={thresholdPercent} initial={condition} />
        <HighestTemperature fit={fit} />
      </div>
    </>
  );
}
