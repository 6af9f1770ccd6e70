import type { Geometry } from '../../../api/types';
import { DeskNumberField, DeskSelect } from '../DeskField';
import { GeometryDrawing } from './GeometryDrawing';
import type { SectionProps } from './sectionProps';
import { DIMENSION_LABELS, SHAPE_DIMENSIONS, SHAPE_NAMES, type Shape } from './specForm';

/** The drawing keeps the last dimensions that made sense while one is being retyped. */
function drawable(fields: SectionProps['fields']): Geometry | null {
  const dims = SHAPE_DIMENSIONS[fields.shape].map(
    (name) => [name, Number(fields.dimensions[name])] as const,
  );
  if (!dims.every(([, v]) => Number.isFinite(v) && v > 0)) return null;
  return { shape: fields.shape, ...Object.fromEntries(dims) } as Geometry;
}

/** Shape picker, the part's dimensions, bonding, and a dimensioned drawing of it. */
export function GeometrySection({ fields, problems, onChange, readOnly }: SectionProps) {
  const geometry = drawable(fields);
  return (
    <fieldset className="desk-card" disabled={readOnly}>
      <legend>
        <strong>Shape and size</strong>
      </legend>
      <div className="desk-shapes" role="group" aria-label="Shape">
        {(Object.keys(SHAPE_NAMES) as Shape[]).map((shape) => (
          <button
            key={shape}
            type="button"
            aria-pressed={fields.shape === shape}
            onClick={() =>
              onChange({ shape, dimensions: { thickness: fields.dimensions.thickness } })
            }
          >
            {SHAPE_NAMES[shape]}
          </button>
        ))}
      </div>
      <div className="desk-grid desk-grid--4">
        {SHAPE_DIMENSIONS[fields.shape].map((name) => (
          <DeskNumberField
            key={name}
            label={DIMENSION_LABELS[name]}
            unit="mm"
            value={fields.dimensions[name] ?? ''}
            problem={problems[name]}
            onChange={(value) => onChange({ dimensions: { ...fields.dimensions, [name]: value } })}
          />
        ))}
      </div>
      <label className="desk-check">
        <input
          type="checkbox"
          checked={fields.bonded}
          onChange={(e) => onChange({ bonded: e.target.checked })}
        />
        Bonded to metal plates
      </label>
      {!fields.bonded && (
        <DeskSelect
          label="Unbonded faces in the load test"
          value={fields.unbondedFaces}
          onChange={(unbondedFaces) => onChange({ unbondedFaces })}
          options={[
            ['friction', 'held by friction: show the slipping and bonded bounds'],
            ['lubricated', 'lubricated plates: faces slip freely'],
          ]}
        />
      )}
      {geometry ? (
        <GeometryDrawing geometry={geometry} bonded={fields.bonded} />
      ) : (
        <p className="desk-muted">The drawing returns when every dimension is a length above 0.</p>
      )}
    </fieldset>
  );
}
