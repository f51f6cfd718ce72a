import { Controller, type Control, type FieldPath, type FieldValues } from 'react-hook-form';

import { TextField, type TextFieldProps } from '@/components/ui/text-field';

export interface FormFieldProps<TValues extends FieldValues> extends Omit<TextFieldProps, 'value' | 'onChangeText' | 'onBlur' | 'error'> {
  // Any transformed-values type: forms whose resolver turns text into numbers (e.g. the bow form) bind here too.

  control: Control<TValues, any, any>;
  name: FieldPath<TValues>;
  /** Turns the form value into the input's text. Default: '' for null/undefined, else String(value). */
  format?: (value: unknown) => string;
  /** Turns the typed text into the form value. Default: the text itself. */
  parse?: (text: string) => unknown;
}

const defaultFormat = (value: unknown) => (value === null || value === undefined ? '' : String(value));

/**
 * A TextField bound to a react-hook-form field: shows the field's error
 * (from the zod resolver or from `setError` with a server message).
 * Example: `<FormField control={control} name="email" label="E-mail" autoComplete="email" />`
 */
export function FormField<TValues extends FieldValues>({
  control,
  name,
  format = defaultFormat,
  parse,
  ...fieldProps
}: FormFieldProps<TValues>) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <TextField
          {...fieldProps}
          ref={field.ref}
          value={format(field.value)}
          onChangeText={(text) => field.onChange(parse ? parse(text) : text)}
          onBlur={field.onBlur}
          error={fieldState.error?.message}
        />
      )}
    />
  );
}
