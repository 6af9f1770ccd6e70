import { lazy, Suspense, useMemo } from 'react';
import type { Inspection, SpecRevision } from '../../api/types';
import { useEngine } from '../../inspect/engine';
import { loadCurve } from '../../inspect/loadCurve';
import { toPartSpec } from '../../inspect/partSpec';

// recharts stays out of every bundle but this chart's.
const LoadChart = lazy(async () => ({ default: (await import('./LoadChart')).LoadChart }));

interface LoadChartPanelProps {
  revision: Pick<SpecRevision, 'body' | 'fit' | 'partSpec'> | undefined;
  inspections: Inspection[];
}

/** Works out the expected curve for the lot's revision with the engine, then draws it. */
export function LoadChartPanel({ revision, inspections }: LoadChartPanelProps) {
  const engine = useEngine();
  const spec = revision && toPartSpec(revision);
  const worked = useMemo(() => {
    if (!engine || !spec) return undefined;
    try {
      const curve = loadCurve(engine, spec);
      const atTest = engine.expectedLoad(engine.specLoadCase(spec));
      return { curve, band: engine.loadLimits(atTest, engine.specLoadTolerance(spec)) };
    } catch (error) {
      return { problem: error instanceof Error ? error.message : String(error) };
    }
  }, [engine, spec]);

  if (revision && !revision.fit)
    return <p>This revision has no fitted compound: no expected load.</p>;
  if (!worked || !spec) return <p>Working out the expected load…</p>;
  if ('problem' in worked) return <p className="field-error">{worked.problem}</p>;
  const measured = inspections
    .filter((i) => !i.supersededBy && i.measurements.load !== undefined)
    .map((i) => ({ sampleIndex: i.sampleIndex, load: i.measurements.load ?? 0 }));
  return (
    <Suspense fallback={<p>Drawing…</p>}>
      <LoadChart
        curve={worked.curve}
        testDeflection={spec.testDeflection}
        measured={measured}
        band={worked.band}
      />
    </Suspense>
  );
}
