import type { ReactNode } from 'react';
import { Controller, type Control, type FieldPath, type FieldValues } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { space } from '@/components/theme';
import { localeDateOrder, parseDateText } from '@/shared/units';

export interface TypedDateFieldProps<TValues extends FieldValues> {
  control: Control<TValues, any, any>;
  name: FieldPath<TValues>;
  label: string;
  disabled?: boolean;
  testID?: string;
  /** Drawn beside the text (the web's native date picker); absent on phones' native builds. */
  picker?: (props: { iso: string | undefined; disabled: boolean; onPick: (iso: string) => void; label: string }) => ReactNode;
}

/**
 * A date typed as YYYY-MM-DD or in the device's numeric form (12/02/2026),
 * with a line under it saying how a two-way form was read. The web build adds
 * a native date picker beside it (date-field.web.tsx).
 * Example: `<TypedDateField control={control} name="date" label="Date" />`
 */
export function TypedDateField<TValues extends FieldValues>({
  control,
  name,
  label,
  disabled = false,
  testID,
  picker,
}: TypedDateFieldProps<TValues>) {
  const order = localeDateOrder();
  const example = order === 'MDY' ? '12/02/2026' : order === 'DMY' ? '02/12/2026' : '2026-12-02';
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => {
        const text = typeof field.value === 'string' ? field.value : '';
        const read = parseDateText(text, order);
        return (
          <View style={styles.group}>
            <View style={styles.row}>
              <View style={styles.text}>
                <TextField
                  ref={field.ref}
                  label={label}
                  hint={`YYYY-MM-DD or ${example}`}
                  value={text}
                  onChangeText={field.onChange}
                  onBlur={field.onBlur}
                  error={fieldState.error?.message}
                  disabled={disabled}
                  testID={testID}
                  autoComplete="off"
                />
              </View>
              {picker
                ? picker({ iso: read.iso, disabled, label: `${label}: pick on a calendar`, onPick: (iso) => field.onChange(iso) })
                : null}
            </View>
            {read.note && !fieldState.error ? (
              <Text variant="small" tone="soft" testID={testID ? `${testID}-read` : undefined}>
                {read.note}
              </Text>
            ) : null}
          </View>
        );
      }}
    />
  );
}

const styles = StyleSheet.create({
  group: { gap: space.xxs },
  // The picker sits beside the text when there is room and wraps under it in a narrow column.
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: space.sm },
  text: { flexGrow: 1, flexShrink: 1, flexBasis: 170, minWidth: 150 },
});
