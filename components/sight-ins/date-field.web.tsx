import type { FieldValues } from 'react-hook-form';

import { TypedDateField, type TypedDateFieldProps } from '@/components/sight-ins/typed-date-field';
import { borders, colors, layout, radii, space } from '@/components/theme';

// On the web, the browser's own date picker (<input type="date">, its value
// always YYYY-MM-DD) sits beside the text, which still takes typed dates.

const pickerStyle = {
  minHeight: layout.minTap,
  padding: `0 ${space.sm}px`,
  borderRadius: radii.md,
  border: `${borders.control}px solid ${colors.lineStrong}`,
  background: colors.surface,
  color: colors.ink,
  font: 'inherit',
  fontSize: 16,
};

/** The typed date field with the browser's date picker beside it. */
export function DateField<TValues extends FieldValues>(props: Omit<TypedDateFieldProps<TValues>, 'picker'>) {
  return (
    <TypedDateField
      {...props}
      picker={({ iso, disabled, onPick, label }) => (
        <input
          type="date"
          aria-label={label}
          data-testid={props.testID ? `${props.testID}-picker` : undefined}
          value={iso ?? ''}
          disabled={disabled}
          onChange={(event) => {
            if (event.currentTarget.value) onPick(event.currentTarget.value);
          }}
          style={pickerStyle}
        />
      )}
    />
  );
}
