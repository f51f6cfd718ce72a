import { fireEvent, render, screen } from '@testing-library/react';
import { useEffect } from 'react';
import { useForm } from 'react-hook-form';

import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormField } from '@/components/ui/form-field';
import { ReadinessBadge } from '@/components/ui/readiness-badge';
import { SectionHeading } from '@/components/ui/section-heading';
import { TextField } from '@/components/ui/text-field';

describe('Button', () => {
  it('calls onPress when pressed', () => {
    const onPress = jest.fn();
    render(<Button label="Save bow" onPress={onPress} />);
    fireEvent.click(screen.getByRole('button', { name: 'Save bow' }));
    expect(onPress).toHaveBeenCalledTimes(1);
  });

  it('while pending shows the pending label, is disabled and ignores presses', () => {
    const onPress = jest.fn();
    render(<Button label="Save bow" pendingLabel="Saving…" pending onPress={onPress} />);
    const button = screen.getByRole('button', { name: 'Saving…' });
    expect(button.getAttribute('aria-disabled')).toBe('true');
    expect(button.getAttribute('aria-busy')).toBe('true');
    expect(screen.queryByText('Save bow')).toBeNull();
    fireEvent.click(button);
    expect(onPress).not.toHaveBeenCalled();
  });

  it('when disabled ignores presses', () => {
    const onPress = jest.fn();
    render(<Button label="Delete" variant="danger" disabled onPress={onPress} />);
    fireEvent.click(screen.getByRole('button', { name: 'Delete' }));
    expect(onPress).not.toHaveBeenCalled();
  });
});

describe('TextField', () => {
  it('is named by its label and described by its hint', () => {
    render(<TextField label="Sight radius" hint="Peep to pin, at full draw" unit="mm" value="" onChangeText={() => {}} />);
    const input = screen.getByLabelText('Sight radius');
    const hint = screen.getByText('Peep to pin, at full draw');
    expect(input.getAttribute('aria-describedby')).toBe(hint.getAttribute('id'));
    expect(input.getAttribute('aria-invalid')).toBeNull();
    expect(screen.getByText('mm')).toBeTruthy();
  });

  it('shows an error as an alert tied to the input, and passes typed text on', () => {
    const onChangeText = jest.fn();
    render(<TextField label="Draw weight" unit="lb" numeric error="Enter a number" value="6o" onChangeText={onChangeText} />);
    const input = screen.getByLabelText('Draw weight');
    const error = screen.getByRole('alert');
    expect(error.textContent).toBe('Enter a number');
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect(input.getAttribute('aria-describedby')).toContain(error.getAttribute('id'));
    expect(input.getAttribute('inputmode')).toBe('decimal');
    fireEvent.change(input, { target: { value: '60' } });
    expect(onChangeText).toHaveBeenCalledWith('60');
  });
});

describe('FormField', () => {
  function Harness({ serverError }: { serverError?: string }) {
    const { control, setError, watch } = useForm<{ nickname: string }>({ defaultValues: { nickname: 'Old Cedar' } });
    useEffect(() => {
      if (serverError) setError('nickname', { type: 'server', message: serverError });
    }, [serverError, setError]);
    return (
      <>
        <FormField control={control} name="nickname" label="Nickname" />
        <span data-testid="value">{watch('nickname')}</span>
      </>
    );
  }

  it('binds the input to the form value both ways', () => {
    render(<Harness />);
    const input = screen.getByLabelText('Nickname') as HTMLInputElement;
    expect(input.value).toBe('Old Cedar');
    fireEvent.change(input, { target: { value: 'Ridge Runner' } });
    expect(screen.getByTestId('value').textContent).toBe('Ridge Runner');
  });

  it("shows the field's error (e.g. a server message set with setError)", async () => {
    render(<Harness serverError="You already have a bow with that nickname" />);
    expect(await screen.findByText('You already have a bow with that nickname')).toBeTruthy();
    expect(screen.getByLabelText('Nickname').getAttribute('aria-invalid')).toBe('true');
  });
});

describe('ReadinessBadge', () => {
  it.each([
    ['verified', 'Verified'],
    ['due', 'Check due'],
    ['failed', 'Failed'],
    ['none', 'Not checked'],
  ] as const)('says "%s" in words: %s', (state, word) => {
    render(<ReadinessBadge state={state} subject="Level" testID="badge" />);
    expect(screen.getByText(word)).toBeTruthy();
    expect(screen.getByTestId('badge').getAttribute('aria-label')).toBe(`Level: ${word}`);
  });

  it('takes a custom label', () => {
    render(<ReadinessBadge state="due" label="String changed" />);
    expect(screen.getByText('String changed')).toBeTruthy();
  });
});

describe('Banner', () => {
  it('announces errors as alerts and names the tone in words when untitled', () => {
    render(<Banner tone="error">The bench could not be loaded.</Banner>);
    const banner = screen.getByRole('alert');
    expect(banner.textContent).toContain('Problem');
    expect(banner.textContent).toContain('The bench could not be loaded.');
  });

  it('shows a caution politely with its word', () => {
    render(<Banner tone="caution">Bow presses can injure: wear eye protection.</Banner>);
    const banner = screen.getByRole('status');
    expect(banner.textContent).toContain('Caution');
  });
});

describe('SectionHeading', () => {
  it('is a heading at the given level', () => {
    render(<SectionHeading level={1} title="Bench" description="Your bows" />);
    const heading = screen.getByRole('heading', { name: 'Bench' });
    expect(heading.getAttribute('aria-level')).toBe('1');
  });
});
