import { useId, useMemo, useState, type ReactNode } from 'react';
import type { CompoundRecord, DeskSpecBody, FitRecord } from '../../../api/desk/types';
import { toPartSpec } from '../../../inspect/partSpec';
import { CautionNote } from '../../inspect/CautionNote';
import { DerivedPanel } from './DerivedPanel';
import { GeometrySection } from './GeometrySection';
import { HardnessSetSection } from './HardnessSetSection';
import { LoadTestSection } from './LoadTestSection';
import { MechanicsSection } from './MechanicsSection';
import { SamplingSection } from './SamplingSection';
import { draftPartSpec } from './partSpec';
import { deriveSpec } from './specDerived';
import { bodyFromFields, type SpecFields } from './specForm';
import { ToleranceSection } from './ToleranceSection';
import { ErrorAlert } from '../ErrorAlert';

interface Props {
  initial: SpecFields;
  compounds: CompoundRecord[];
  /** Released revisions are frozen: shown, never edited. */
  readOnly: boolean;
  /** A released revision's own fit; otherwise the chosen compound's current constants are used. */
  frozenFit?: FitRecord | null;
  /** The buttons below the form, given the body as it stands (null while a field is wrong). */
  actions?(body: DeskSpecBody | null): ReactNode;
}

/** A released revision is worked out with its frozen fit, a draft with the compound's current one. */
function Derived({
  body,
  compounds,
  frozenFit,
}: { body: DeskSpecBody | null } & Pick<Props, 'compounds' | 'frozenFit'>) {
  const derivation = useMemo(() => {
    if (!body) return null;
    const spec = frozenFit
      ? toPartSpec({ body, fit: frozenFit })
      : draftPartSpec(
          body,
          compounds.find((c) => c.id === body.compoundId),
        );
    return spec ? deriveSpec(spec) : null;
  }, [body, compounds, frozenFit]);
  if (!body) {
    return (
      <p className="desk-callout desk-callout--warn">
        Fix the marked fields to see the expected load.
      </p>
    );
  }
  if (!derivation) {
    return (
      <p className="desk-muted">The expected load needs a compound with published constants.</p>
    );
  }
  if ('error' in derivation) {
    return <ErrorAlert>The engine cannot work this spec out — {derivation.error}</ErrorAlert>;
  }
  // Unbonded faces held by friction lie between the lubricated and the bonded estimate.
  const bounded = !body.bonded && body.unbondedFaces !== 'lubricated';
  return (
    <DerivedPanel
      derivation={derivation.value}
      testDeflection={body.testDeflection}
      bounded={bounded}
    />
  );
}

/** A part spec as a form on the left and, as it is typed, everything derived from it on the right. */
export function SpecEditor({ initial, compounds, readOnly, frozenFit, actions }: Props) {
  const id = useId();
  const [fields, setFields] = useState(initial);
  const result = useMemo(() => bodyFromFields(fields), [fields]);
  const section = {
    fields,
    problems: result.problems,
    readOnly,
    onChange: (patch: Partial<SpecFields>) => setFields({ ...fields, ...patch }),
  };
  return (
    <div className="desk-split">
      <div className="desk-main" style={{ padding: 0 }}>
        <GeometrySection {...section} />
        <LoadTestSection {...section} compounds={compounds} />
        <ToleranceSection {...section} />
        <HardnessSetSection {...section} />
        <MechanicsSection
          {...section}
          compound={compounds.find((c) => c.id === fields.compoundId)}
        />
        <SamplingSection {...section} body={result.body} />
        <div className="desk-field">
          <label htmlFor={`${id}-note`}>What changed in this revision</label>
          <textarea
            id={`${id}-note`}
            rows={2}
            disabled={readOnly}
            value={fields.note}
            onChange={(e) => setFields({ ...fields, note: e.target.value })}
          />
        </div>
        {actions?.(result.body)}
      </div>
      <div>
        <div className="desk-follow">
          {result.body && <CautionNote body={result.body} />}
          <Derived body={result.body} compounds={compounds} frozenFit={frozenFit} />
        </div>
      </div>
    </div>
  );
}
