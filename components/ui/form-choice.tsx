import { Controller, type Control, type FieldPath, type FieldValues } from 'react-hook-form';

import { SegmentedControl, type SegmentOption } from '@/components/ui/segmented-control';

export interface FormChoiceProps<TValues extends FieldValues, TValue extends string> {
  control: Control<TValues, any, any>;
  name: FieldPath<TValues>;
  label: string;
  hint?: string;
  options: readonly SegmentOption<TValue>[];
  disabled?: boolean;
  testID?: string;
}

/**
 * A SegmentedControl bound to a react-hook-form field (shows its error).
 * Example: `<FormChoice control={control} name="hand" label="Hand" options={handOptions} />`
 */
export function FormChoice<TValues extends FieldValues, TValue extends string>({
  control,
  name,
  ...props
}: FormChoiceProps<TValues, TValue>) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <SegmentedControl<TValue>
          {...props}
          value={field.value as TValue | undefined}
          onChange={(value) => field.onChange(value)}
          error={fieldState.error?.message}
        />
      )}
    />
  );
}
