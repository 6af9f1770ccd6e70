import { fireEvent, render, screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import type { TestSet } from '../../../api/desk/types';
import { fitModel, MODES } from '../../../engine';
import { TRELOAR_1944 } from '../../../engine/fixtures/treloar-1944';
import { formatNumber } from '../format';
import { FitSetup, type FitRequest } from './FitSetup';
import { FitTable } from './FitTable';
import { BUILT_IN_CHOICES } from './modelChoices';
import { runFits } from './runFits';
import { StabilityTable } from './StabilityTable';

// Treloar 1944 (REFERENCES §3), one test set per mode, as the CSV import stores them.
const sets: TestSet[] = MODES.map((mode) => ({
  id: mode,
  compoundId: 'nr',
  name: `Treloar 1944 — ${mode}`,
  mode,
  points: TRELOAR_1944[mode].map(([stretch, stress]) => ({ stretch, stress })),
}));

function setUp(onFit: (request: FitRequest) => void) {
  render(<FitSetup testSets={sets} choices={BUILT_IN_CHOICES} busy={false} onFit={onFit} />);
}

describe('fit workbench', () => {
  it('asks for Yeoh on all three modes with the plain sum when no weight is changed', () => {
    const onFit = vi.fn<(request: FitRequest) => void>();
    setUp(onFit);
    fireEvent.click(screen.getByRole('button', { name: 'Fit 1 model' }));
    const request = onFit.mock.calls[0]?.[0];
    expect(request?.data).toHaveLength(25 + 17 + 14);
    expect(request?.choices.map((c) => c.key)).toEqual(['yeoh']);
    expect(request?.weights).toEqual({});
    expect(request?.objective).toBe('absolute');
  });

  it('passes changed per-mode weights and the relative objective', () => {
    const onFit = vi.fn<(request: FitRequest) => void>();
    setUp(onFit);
    fireEvent.change(screen.getByLabelText('weight of planar'), { target: { value: '3' } });
    fireEvent.change(screen.getByLabelText('Objective'), { target: { value: 'relative' } });
    fireEvent.click(screen.getByLabelText('Mooney–Rivlin'));
    fireEvent.click(screen.getByRole('button', { name: 'Fit 2 models' }));
    const request = onFit.mock.calls[0]?.[0];
    expect(request?.weights).toEqual({ planar: 3 });
    expect(request?.objective).toBe('relative');
    expect(request?.choices.map((c) => c.key)).toEqual(['mooney-rivlin', 'yeoh']);
  });

  it('shows the constants, fit quality and stability the engine reports', async () => {
    const onFit = vi.fn<(request: FitRequest) => void>();
    setUp(onFit);
    fireEvent.click(screen.getByRole('button', { name: 'Fit 1 model' }));
    const request = onFit.mock.calls[0]?.[0] as FitRequest;
    const start = request.choices[0]?.start(request.data);
    if (!start) throw new Error('no start');
    const outcomes = await runFits([
      { label: 'Yeoh', options: { model: start, data: request.data, objective: 'absolute' } },
    ]);
    render(
      <>
        <FitTable outcomes={outcomes} />
        <StabilityTable outcomes={outcomes} />
      </>,
    );
    const engine = fitModel({ model: start, data: request.data, objective: 'absolute' });
    if (engine.model.kind !== 'yeoh') throw new Error('not Yeoh');
    const row = within(screen.getByRole('table', { name: 'Fit results' })).getAllByRole('row')[1];
    expect(row?.textContent).toContain(`C10 = ${formatNumber(engine.model.c10, 5)} MPa`);
    expect(row?.textContent).toContain(formatNumber(engine.mu0));
    expect(row?.textContent).toContain(
      `${formatNumber(engine.rmsByMode.planar, 3)} / ${formatNumber(engine.r2ByMode.planar, 4)}`,
    );
    expect(screen.getByRole('table', { name: 'Stability' }).textContent).toMatch(/uniaxial/);
  });
});
