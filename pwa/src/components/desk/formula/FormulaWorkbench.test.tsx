import { fireEvent, render, screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { FormulaWorkbench } from './FormulaWorkbench';
import type { FormulaDraft } from './reviewFormula';

const mooneyRivlin: FormulaDraft = {
  name: 'Two-term invariant',
  energy: 'C10 (I1 - 3) + C01 (I2 - 3)',
  constants: [
    { name: 'C10', value: '0.16' },
    { name: 'C01', value: '0.04' },
  ],
};

function typeEnergy(text: string) {
  fireEvent.change(screen.getByLabelText('W(I1, I2) ='), { target: { value: text } });
}

describe('formula model editor', () => {
  it('accepts a correct energy and shows μ₀ from the engine', () => {
    render(<FormulaWorkbench initial={mooneyRivlin} onSave={vi.fn()} />);
    expect(screen.getByText('Reads correctly.')).toBeTruthy();
    // μ₀ = 2(C10 + C01) = 0.4 MPa for Mooney–Rivlin (REFERENCES §2 table).
    expect(screen.getByText(/μ₀ = 0\.4 MPa · E₀ = 3μ₀ = 1\.2 MPa/)).toBeTruthy();
  });

  it('marks the character where a syntax error stops the reading', () => {
    render(<FormulaWorkbench initial={mooneyRivlin} onSave={vi.fn()} />);
    typeEnergy('C10 (I1 - 3) + * C01 (I2 - 3)');
    const marker = screen.getByTestId('syntax-marker');
    const mark = within(marker).getByLabelText(/^character \d+$/);
    // The stray "*" is the 16th character (0-based 15): where mathjs stops reading.
    expect(mark.textContent).toBe('*');
    expect(mark.getAttribute('aria-label')).toBe('character 16');
    expect(screen.getByRole('list', { name: 'Formula errors' }).textContent).toMatch(/char 16/);
    expect(screen.getByLabelText('W(I1, I2) =').getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByRole('button', { name: 'Keep in my formulas' })).toHaveProperty(
      'disabled',
      true,
    );
  });

  it('names unknown symbols and offers to add them as constants', () => {
    render(<FormulaWorkbench initial={mooneyRivlin} onSave={vi.fn()} />);
    typeEnergy('C10 (I1 - 3) + C01 (I2 - 3) + C11 (I1 - 3) (I2 - 3)');
    expect(screen.getByRole('list', { name: 'Formula errors' }).textContent).toContain(
      'C11 is not I1, I2 or one of the constants',
    );
    fireEvent.click(screen.getByRole('button', { name: 'Add C11 as a constant' }));
    expect(screen.getByText('Reads correctly.')).toBeTruthy();
    expect((screen.getByLabelText('name of constant 3') as HTMLInputElement).value).toBe('C11');
  });

  it('marks the constant row that is wrong and warns about unused constants', () => {
    render(<FormulaWorkbench initial={mooneyRivlin} onSave={vi.fn()} />);
    fireEvent.change(screen.getByLabelText('value of C01'), { target: { value: 'abc' } });
    expect(screen.getByLabelText('value of C01').getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByLabelText('value of C10').getAttribute('aria-invalid')).toBe('false');
    expect(screen.getByRole('list', { name: 'Formula errors' }).textContent).toContain(
      'value of C01 must be a number',
    );
    fireEvent.change(screen.getByLabelText('value of C01'), { target: { value: '0.04' } });
    typeEnergy('C10 (I1 - 3)');
    expect(screen.getByRole('list', { name: 'Formula warnings' }).textContent).toContain(
      'C01 does not appear in W',
    );
  });

  it('keeps the checked formula with numeric constants', () => {
    const onSave = vi.fn();
    render(<FormulaWorkbench initial={mooneyRivlin} onSave={onSave} />);
    fireEvent.click(screen.getByRole('button', { name: 'Keep in my formulas' }));
    expect(onSave).toHaveBeenCalledWith({
      name: 'Two-term invariant',
      energy: 'C10 (I1 - 3) + C01 (I2 - 3)',
      constants: { C10: 0.16, C01: 0.04 },
    });
  });
});
