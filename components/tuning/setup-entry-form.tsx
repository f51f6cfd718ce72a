import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { lengthTextToMm, messageForUnits } from '@/components/forms/form-numbers';
import { todayIso } from '@/components/level/level-words';
import { useAddSetupEntry } from '@/components/tuning/api';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { TextField } from '@/components/ui/text-field';
import { space } from '@/components/theme';
import type { LengthUnit } from '@/shared/auth';
import { setupEntryInputSchema, setupMeasures, type SetupMeasureKey } from '@/shared/setup-measures';

export interface SetupEntryFormProps {
  bowId: number;
  measure: SetupMeasureKey;
  unit: LengthUnit;
  onDone: () => void;
}

type Errors = Partial<Record<'valueMm' | 'choice' | 'measuredOn' | 'note' | 'form', string>>;

/**
 * A new entry for one measure: the value in the archer's unit (or a choice,
 * with an amount), the date (today by default) and a note. Checked with the
 * shared schema before it is sent; the server's field messages land on the
 * same fields. Nothing is saved until every field is right.
 * Example: `<SetupEntryForm bowId={3} measure="d-loop" unit="in" onDone={close} />`
 */
export function SetupEntryForm({ bowId, measure, unit, onDone }: SetupEntryFormProps) {
  const spec = setupMeasures[measure];
  const add = useAddSetupEntry(bowId);
  const [valueText, setValueText] = useState('');
  const [choice, setChoice] = useState<string | null>(null);
  const [date, setDate] = useState(todayIso());
  const [note, setNote] = useState('');
  const [errors, setErrors] = useState<Errors>({});
  const showAmount = spec.form === 'length' || (spec.form === 'choice-amount' && choice !== null && choice !== spec.neutral);
  const testID = `setup-form-${measure}`;

  const submit = () => {
    const valueMm = showAmount ? lengthTextToMm(valueText, unit) : undefined;
    const parsed = setupEntryInputSchema.safeParse({
      measure,
      valueMm: valueMm === undefined ? null : valueMm,
      choice,
      measuredOn: date.trim(),
      note,
    });
    if (!parsed.success) {
      const next: Errors = {};
      for (const issue of parsed.error.issues) {
        const key = String(issue.path[0] ?? 'form') as keyof Errors;
        if (!next[key]) next[key] = key === 'valueMm' ? messageForUnits(issue.message, unit) : issue.message;
      }
      setErrors(next);
      return;
    }
    setErrors({});
    add.mutate(parsed.data, {
      onSuccess: onDone,
      onError: (error) => {
        const fields = error.fields as Errors;
        setErrors({
          ...fields,
          valueMm: fields.valueMm ? messageForUnits(fields.valueMm, unit) : undefined,
          form: Object.keys(fields).length ? undefined : error.message,
        });
      },
    });
  };

  return (
    <View style={styles.form} testID={testID}>
      {spec.form !== 'length' ? (
        <SegmentedControl
          label={spec.name}
          options={spec.choices.map((value) => ({ value, label: spec.choiceNames[value], testID: `${testID}-choice-${value}` }))}
          value={choice}
          onChange={setChoice}
          error={errors.choice}
          optionBasis={150}
          testID={`${testID}-choice`}
        />
      ) : null}
      {showAmount ? (
        <TextField
          label={spec.form === 'length' ? `${spec.name} (${unit})` : `Amount (${unit})`}
          hint={spec.hint}
          unit={unit}
          numeric
          value={valueText}
          onChangeText={setValueText}
          error={errors.valueMm}
          testID={`${testID}-value`}
        />
      ) : null}
      <View style={styles.row}>
        <View style={styles.cell}>
          <TextField
            label="Date"
            hint="YYYY-MM-DD"
            value={date}
            onChangeText={setDate}
            error={errors.measuredOn}
            autoCorrect={false}
            testID={`${testID}-date`}
          />
        </View>
        <View style={styles.cell}>
          <TextField label="Note (optional)" value={note} onChangeText={setNote} error={errors.note} testID={`${testID}-note`} />
        </View>
      </View>
      {errors.form ? (
        <Banner tone="error" title="Not saved">
          {errors.form}
        </Banner>
      ) : null}
      <View style={styles.row}>
        <Button label="Save the entry" pendingLabel="Saving…" pending={add.isPending} onPress={submit} testID={`${testID}-save`} />
        <Button label="Cancel" variant="secondary" onPress={onDone} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 150 },
});
