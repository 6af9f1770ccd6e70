import { fireEvent, render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { CompoundRecord, FitRecord } from '../../../api/desk/types';
import {
  acceptanceWindows,
  expectedLoad,
  specLoadCase,
  specLoadTolerance,
  type PartSpec,
} from '../../../engine';
import { formatNumber } from '../format';
import { SpecEditor } from './SpecEditor';
import { NEW_SPEC_FIELDS } from './specForm';

const fit = {
  id: 'fit-1',
  compoundId: 'nr-60',
  version: 3,
  model: { kind: 'yeoh', c10: 0.45, c20: -0.02, c30: 0.001 },
  objective: 'absolute',
  status: 'published',
  publishedAt: '2026-11-01T00:00:00Z',
  testSetIds: [],
  result: {},
} as unknown as FitRecord;

const compound: CompoundRecord = {
  id: 'nr-60',
  code: 'NR-60',
  name: 'Natural rubber 60',
  polymer: 'NR',
  hardnessShoreA: 60,
  bulkModulusMPa: 2000,
  currentFitId: fit.id,
  currentFit: fit,
};

/** The same spec the editor builds from its fields, handed to the engine directly. */
function engineSpec(overrides: Partial<PartSpec> = {}): PartSpec {
  return {
    geometry: { shape: 'disc', diameter: 100, thickness: 10 },
    bonded: true,
    model: fit.model,
    bulkModulusMPa: 2000,
    testDeflection: 1,
    loadTolerancePercent: 10,
    tolerance: { class: 'M3' },
    hardness: { nominal: 60, tolerance: 5 },
    ...overrides,
  };
}

function renderEditor() {
  render(
    <SpecEditor
      initial={{ ...NEW_SPEC_FIELDS, compoundId: compound.id }}
      compounds={[compound]}
      readOnly={false}
    />,
  );
}

const text = (testId: string) => screen.getByTestId(testId).textContent;

describe('part spec editor', () => {
  it('shows the shape factor of a disc: D/4t = 100/40 = 2.5 (REFERENCES §5)', () => {
    renderEditor();
    expect(text('derived-shape-factor')).toBe('2.5');
  });

  it('shows the expected load, band, stiffness, sensitivities and windows the engine works out', () => {
    renderEditor();
    const spec = engineSpec();
    const load = expectedLoad(specLoadCase(spec));
    const windows = acceptanceWindows(specLoadCase(spec), specLoadTolerance(spec));
    expect(text('derived-load')).toBe(`${formatNumber(load.high.load)} N`);
    expect(text('derived-band')).toBe(
      `${formatNumber(load.high.load * 0.9)} – ${formatNumber(load.high.load * 1.1)} N`,
    );
    expect(text('derived-stiffness')).toBe(`${formatNumber(load.high.stiffness)} N/mm`);
    expect(text('sensitivity-thickness')).toContain(
      formatNumber(load.high.sensitivities.thickness),
    );
    expect(text('sensitivity-hardness')).toContain(formatNumber(load.high.sensitivities.hardness));
    expect(text('window-thickness-min')).toContain(
      `${formatNumber(windows.thickness.min.value, 5)} mm`,
    );
    expect(text('window-thickness-max')).toContain(
      `(${windows.thickness.max.iterations} Newton steps)`,
    );
    expect(text('window-hardness-max')).toContain(
      `${formatNumber(windows.hardness.max.value, 5)} Shore A`,
    );
    // A thicker pad is softer, so the thickness window brackets the nominal 10 mm.
    expect(windows.thickness.min.value).toBeLessThan(10);
    expect(windows.thickness.max.value).toBeGreaterThan(10);
  });

  it('follows each change of the form', () => {
    renderEditor();
    fireEvent.change(screen.getByLabelText('rubber thickness t, mm'), { target: { value: '20' } });
    expect(text('derived-shape-factor')).toBe('1.25');
    const load = expectedLoad(
      specLoadCase(engineSpec({ geometry: { shape: 'disc', diameter: 100, thickness: 20 } })),
    );
    expect(text('derived-load')).toBe(`${formatNumber(load.high.load)} N`);
  });

  it('gives unbonded parts the lubricated and bonded bounds', () => {
    renderEditor();
    fireEvent.click(screen.getByLabelText('Bonded to metal plates'));
    const load = expectedLoad(specLoadCase(engineSpec({ bonded: false })));
    expect(load.low.load).toBeLessThan(load.high.load);
    expect(text('derived-load')).toBe(
      `${formatNumber(load.low.load)} – ${formatNumber(load.high.load)} N`,
    );
  });

  it('looks up the ISO 3302-1 tolerance of each dimension in its own class', () => {
    renderEditor();
    // Table §8: 63–100 mm M3 fixed ± 1.00; 6.3–10 mm M3 fixed ± 0.30; M1 closure ± 0.15.
    expect(text('tolerance-diameter')).toBe('± 1');
    expect(text('tolerance-thickness')).toBe('± 0.3');
    fireEvent.change(screen.getByLabelText('class of thickness'), { target: { value: 'M1' } });
    fireEvent.change(screen.getByLabelText('kind of thickness'), { target: { value: 'closure' } });
    expect(text('tolerance-thickness')).toBe('± 0.15');
  });

  it('marks a deflection that is not less than the thickness and holds the derived values back', () => {
    renderEditor();
    fireEvent.change(screen.getByLabelText('Test deflection, mm'), { target: { value: '12' } });
    expect(screen.getByText('must be less than the thickness 10 mm')).toBeTruthy();
    expect(screen.getByLabelText('Test deflection, mm').getAttribute('aria-invalid')).toBe('true');
    expect(screen.queryByTestId('derived-load')).toBeNull();
  });

  it('shows the sampling plan for a lot (ISO 2859-1: 500 parts, level II → H, n = 50)', () => {
    renderEditor();
    expect(text('plan-preview')).toMatch(/code letter H → sample 50/);
  });
});
