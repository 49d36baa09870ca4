import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { WeightPrompt } from './weight-prompt';

/** The form takes the weight bounds the API applies (contracts' PLAUSIBLE: 0.3–350 kg). */
describe('weight prompt bounds', { timeout: 30_000 }, () => {
  it.each(['0.0001', '0.2', '351', '10000'])('refuses %s kg with the range named', async (kg) => {
    const onWeight = vi.fn();
    render(<WeightPrompt ageGroup="child" onWeight={onWeight} />);
    await userEvent.type(screen.getByLabelText('Weight (kg)'), kg);
    expect(screen.getByText('Weight must be between 0.3 and 350 kg')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Use this weight' })).toBeDisabled();
    expect(onWeight).not.toHaveBeenCalled();
  });

  it('takes a weight at either bound', async () => {
    const onWeight = vi.fn();
    render(<WeightPrompt ageGroup="infant" onWeight={onWeight} />);
    const field = screen.getByLabelText('Weight (kg)');
    for (const kg of ['0.3', '350']) {
      await userEvent.clear(field);
      await userEvent.type(field, kg);
      await userEvent.click(screen.getByRole('button', { name: 'Use this weight' }));
    }
    expect(onWeight.mock.calls.map((c) => c[0])).toEqual([0.3, 350]);
  });
});
