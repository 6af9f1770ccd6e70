import { fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import type { NewTestSet } from '../../../api/desk/types';
import { CsvImportPanel } from './CsvImportPanel';

function paste(text: string) {
  fireEvent.change(screen.getByLabelText('…or paste the rows'), { target: { value: text } });
  fireEvent.click(screen.getByRole('button', { name: 'Read pasted rows' }));
}

describe('CSV import panel', () => {
  it('lists every bad row with its line and reason and keeps the good ones', async () => {
    const onSave = vi.fn<(sets: NewTestSet[]) => Promise<void>>().mockResolvedValue();
    render(<CsvImportPanel onSave={onSave} />);
    paste(
      'mode,stretch,stress_MPa\nuniaxial,1.12,0.14\nuniaxial,x,0.2\n\nplanar,1.06,0.07\nbulge,1.1,0.1\n',
    );

    const leftOut = screen.getByRole('table', { name: 'Rows left out' });
    const rows = within(leftOut).getAllByRole('row').slice(1);
    expect(rows.map((row) => row.textContent)).toEqual([
      '3strain "x" is not a number',
      '6test mode "bulge" is not uniaxial, equibiaxial or planar',
    ]);
    expect(screen.getByLabelText('Import check').textContent).toContain('uniaxial 1, planar 1');

    fireEvent.click(screen.getByRole('button', { name: 'Keep 2 points as test data' }));
    await waitFor(() => expect(onSave).toHaveBeenCalledOnce());
    expect(onSave.mock.calls[0]?.[0]).toEqual([
      {
        name: 'Pasted data — uniaxial',
        mode: 'uniaxial',
        points: [{ stretch: 1.12, stress: 0.14 }],
      },
      { name: 'Pasted data — planar', mode: 'planar', points: [{ stretch: 1.06, stress: 0.07 }] },
    ]);
  });

  it('applies the chosen stress unit and strain measure', async () => {
    const onSave = vi.fn<(sets: NewTestSet[]) => Promise<void>>().mockResolvedValue();
    render(<CsvImportPanel onSave={onSave} />);
    paste('elongation,stress\n50,100\n');

    fireEvent.change(screen.getByLabelText('Deformation is written as'), {
      target: { value: 'strain-percent' },
    });
    fireEvent.change(screen.getByLabelText('Stress unit'), { target: { value: 'kPa' } });
    fireEvent.change(screen.getByLabelText('Test mode'), { target: { value: 'equibiaxial' } });
    fireEvent.click(screen.getByRole('button', { name: 'Keep 1 points as test data' }));

    await waitFor(() => expect(onSave).toHaveBeenCalledOnce());
    // 50 % engineering strain is stretch 1.5; 100 kPa is 0.1 MPa.
    expect(onSave.mock.calls[0]?.[0]).toEqual([
      {
        name: 'Pasted data — equibiaxial',
        mode: 'equibiaxial',
        points: [{ stretch: 1.5, stress: 0.1 }],
      },
    ]);
  });

  it('shows the server refusal and keeps the data on screen', async () => {
    const onSave = vi
      .fn<(sets: NewTestSet[]) => Promise<void>>()
      .mockRejectedValue(new Error('points.0.stretch must be above 0'));
    render(<CsvImportPanel onSave={onSave} />);
    paste('stretch,stress\n1.2,0.3\n');
    fireEvent.click(screen.getByRole('button', { name: 'Keep 1 points as test data' }));
    expect(await screen.findByText(/points\.0\.stretch must be above 0/)).toBeTruthy();
    expect(screen.getByRole('table', { name: 'File preview' })).toBeTruthy();
  });
});
