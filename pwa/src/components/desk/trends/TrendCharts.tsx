import { useNavigate } from 'react-router-dom';
import type { DeskSpecRevision, MeasurementRow } from '../../../api/desk/types';
import { xbarRLimits } from '../../../engine';
import { engineAnswer } from '../engineAnswer';
import { formatNumber } from '../format';
import { CapabilityPanel } from './CapabilityPanel';
import { ConstantsUsed } from './ConstantsUsed';
import { ControlChart } from './ControlChart';
import { specLimits } from './specLimits';
import { CHARACTERISTICS, lotSubgroups, outOfControl, type Characteristic } from './subgroups';

interface Props {
  rows: MeasurementRow[];
  characteristic: Characteristic;
  revision: DeskSpecRevision | null;
}

/** X̄ and R charts of one characteristic, its out-of-control lots and its capability. */
export function TrendCharts({ rows, characteristic, revision }: Props) {
  const navigate = useNavigate();
  const { label, unit } = CHARACTERISTICS[characteristic];
  const grouping = lotSubgroups(rows, characteristic);
  const values = grouping.subgroups.map((s) => s.values);
  const limits = engineAnswer(() => xbarRLimits(values));
  if ('error' in limits) {
    return (
      <p className="desk-callout desk-callout--warn">
        No chart for {label} yet: {limits.error}. Charts need two or more lots with at least two
        parts measured.
      </p>
    );
  }
  const chart = limits.value;
  const flagged = outOfControl(grouping.subgroups, chart);
  const outIndex = new Set(flagged.map((f) => f.index));
  const points = (series: number[]) =>
    grouping.subgroups.map((s, i) => ({
      label: s.lotNumber,
      value: series[i] ?? Number.NaN,
      out: outIndex.has(i),
      lotId: s.lotId,
    }));
  const openLot = (lotId: string) => navigate(`/review/${lotId}`);
  const specification = revision ? engineAnswer(() => specLimits(revision, characteristic)) : null;
  return (
    <>
      <p className="desk-muted">
        {grouping.subgroups.length} lots, {grouping.size} parts each (first parts sampled), in
        molding order.
        {grouping.leftOut.length > 0 &&
          ` Left off: ${grouping.leftOut.map((l) => `${l.lotNumber} (${l.count} measured)`).join(', ')}.`}
      </p>
      <div className="desk-split">
        <ControlChart
          title={`Lot means (X-bar chart) — ${label}, ${unit}`}
          points={points(chart.means)}
          centre={chart.grandMean}
          upper={chart.xbarUcl}
          lower={chart.xbarLcl}
          onOpenLot={openLot}
        />
        <ControlChart
          title={`Lot ranges (R chart) — ${label}, ${unit}`}
          points={points(chart.ranges)}
          centre={chart.meanRange}
          upper={chart.rUcl}
          lower={chart.rLcl}
          onOpenLot={openLot}
        />
      </div>
      <ConstantsUsed limits={chart} />
      <section className="desk-card" aria-label="Out-of-control lots">
        <h3>Lots outside the control limits</h3>
        {flagged.length === 0 ? (
          <p className="desk-muted">None: every lot's mean and range is inside its limits.</p>
        ) : (
          <table className="desk-table">
            <thead>
              <tr>
                <th scope="col">lot</th>
                <th scope="col">press · cavity</th>
                <th scope="col" className="num">
                  mean
                </th>
                <th scope="col" className="num">
                  range
                </th>
                <th scope="col">why</th>
              </tr>
            </thead>
            <tbody>
              {flagged.map(({ index, subgroup, reasons }) => (
                <tr key={subgroup.lotId}>
                  <td>
                    <a
                      href={`/review/${subgroup.lotId}`}
                      onClick={(e) => (e.preventDefault(), openLot(subgroup.lotId))}
                    >
                      {subgroup.lotNumber}
                    </a>
                  </td>
                  <td>
                    {subgroup.pressCode} · {subgroup.cavity}
                  </td>
                  <td className="num">{formatNumber(chart.means[index])}</td>
                  <td className="num">{formatNumber(chart.ranges[index])}</td>
                  <td>{reasons.join('; ')}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
      {specification === null ? (
        <p className="desk-muted">No released revision: capability needs its limits.</p>
      ) : 'error' in specification ? (
        <p className="desk-callout desk-callout--warn">
          No limits for capability: {specification.error}
        </p>
      ) : (
        <CapabilityPanel subgroups={values} limits={specification.value} unit={unit} />
      )}
    </>
  );
}
