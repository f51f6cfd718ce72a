/**
 * The UI kit's segmented control in both sizes, and the level check's result
 * buttons built on it: radios in a named group, the choice reported and shown,
 * nothing chosen while disabled.
 */
import { fireEvent, render, screen, within } from '@testing-library/react';

import { ResultButtons } from '@/components/level/result-buttons';
import { SegmentedControl } from '@/components/ui/segmented-control';

const places = [
  { value: 'bench', label: 'At the bench' },
  { value: 'range', label: 'At the range' },
] as const;

describe('SegmentedControl', () => {
  for (const size of ['regular', 'large'] as const) {
    it(`is a radio group named by its label that reports the choice (${size})`, () => {
      const onChange = jest.fn();
      render(<SegmentedControl label="Where" size={size} options={places} value="bench" onChange={onChange} testID="where" />);
      const group = screen.getByRole('radiogroup', { name: 'Where' });
      expect(within(group).getByRole('radio', { name: 'At the bench' }).getAttribute('aria-checked')).toBe('true');
      expect(within(group).getByRole('radio', { name: 'At the range' }).getAttribute('aria-checked')).toBe('false');
      fireEvent.click(within(group).getByRole('radio', { name: 'At the range' }));
      expect(onChange).toHaveBeenCalledWith('range');
    });
  }

  it('shows nothing chosen for a null value, and an error as an alert', () => {
    render(<SegmentedControl label="Where" size="large" options={places} value={null} onChange={jest.fn()} error="Choose where" />);
    for (const radio of screen.getAllByRole('radio')) expect(radio.getAttribute('aria-checked')).toBe('false');
    expect(screen.getByRole('alert').textContent).toBe('Choose where');
  });
});

describe('ResultButtons', () => {
  it('offers the four results with their hints and test ids, and reports the one pressed', () => {
    const onChange = jest.fn();
    render(<ResultButtons value="pass" onChange={onChange} testID="first-axis" />);
    const group = screen.getByRole('radiogroup', { name: 'Result' });
    expect(within(group).getAllByRole('radio')).toHaveLength(4);
    expect(screen.getByTestId('first-axis-result-pass').getAttribute('aria-checked')).toBe('true');
    expect(within(screen.getByTestId('first-axis-result-adjusted')).getByText('Was off; now level')).toBeTruthy();
    fireEvent.click(screen.getByTestId('first-axis-result-fail'));
    expect(onChange).toHaveBeenCalledWith('fail');
  });

  it('ignores presses while disabled', () => {
    const onChange = jest.fn();
    render(<ResultButtons value={null} onChange={onChange} disabled testID="range" />);
    const skipped = screen.getByTestId('range-result-skipped');
    expect(skipped.getAttribute('aria-disabled')).toBe('true');
    fireEvent.click(skipped);
    expect(onChange).not.toHaveBeenCalled();
  });
});
