import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { useLogChange } from '@/components/level/api';
import { todayIso } from '@/components/level/level-words';
import { bigTap } from '@/components/level/result-buttons';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormField } from '@/components/ui/form-field';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { space } from '@/components/theme';
import {
  bowChangeFormSchema,
  bowChangeKinds,
  changedAtFrom,
  type BowChangeFormValues,
  type BowChangeKind,
  type LevelSummary,
} from '@/shared/level';

/** Short words for the kind buttons. */
const kindWords: Record<BowChangeKind, string> = {
  string: 'String',
  cables: 'Cables',
  'sight-moved': 'Sight moved',
  'sight-remounted': 'Sight re-mounted',
  rest: 'Rest',
  peep: 'Peep',
  arrows: 'Arrows',
  other: 'Other',
  'nock-height': 'Nock height',
  'd-loop': 'D-loop',
  cams: 'Cams',
  'sight-radius': 'Sight radius',
};
const kindOptions = bowChangeKinds.map((value) => ({ value, label: kindWords[value] }));

export interface ChangeFormProps {
  bowId: number;
  /** Called after the change is logged, with the bow's new level state. */
  onLogged?: (level: LevelSummary) => void;
  onCancel?: () => void;
}

type ChangeFormOut = { kind: BowChangeKind; date: string; time: string; note: string };

/**
 * Log a change on the bow: what, the date (today by default) and an optional
 * time, a note. Without a time, today means now and an earlier date means the
 * end of that day, so a change on the day of a check counts as after it.
 * Example: `<ChangeForm bowId={3} onLogged={() => setOpen(false)} />`
 */
export function ChangeForm({ bowId, onLogged, onCancel }: ChangeFormProps) {
  const log = useLogChange(bowId);
  const [general, setGeneral] = useState<string | null>(null);
  const { control, handleSubmit, setError } = useForm<BowChangeFormValues, unknown, ChangeFormOut>({
    resolver: zodResolver(bowChangeFormSchema),
    defaultValues: { kind: undefined, date: todayIso(), time: '', note: '' },
  });

  const submit = handleSubmit((values) => {
    setGeneral(null);
    const changedAt = changedAtFrom(values.date, values.time, new Date()).toISOString();
    log.mutate(
      { kind: values.kind, changedAt, note: values.note },
      {
        onSuccess: (result) => onLogged?.(result.level),
        onError: (error) => {
          if (error.fields.changedAt) setError('date', { message: error.fields.changedAt });
          if (error.fields.note) setError('note', { message: error.fields.note });
          if (!error.fields.changedAt && !error.fields.note) setGeneral(error.message);
        },
      },
    );
  });

  return (
    <View style={styles.form} testID="change-form">
      <Controller
        control={control}
        name="kind"
        render={({ field, fieldState }) => (
          <SegmentedControl
            size="large"
            label="What changed"
            options={kindOptions}
            value={field.value}
            onChange={field.onChange}
            error={fieldState.error?.message}
            testID="change-kind"
          />
        )}
      />
      <View style={styles.row}>
        <View style={styles.cell}>
          <FormField control={control} name="date" label="Date" hint="YYYY-MM-DD" autoCorrect={false} testID="change-date" />
        </View>
        <View style={styles.cell}>
          <FormField control={control} name="time" label="Time (optional)" hint="HH:MM, 24-hour" autoCorrect={false} testID="change-time" />
        </View>
      </View>
      <FormField
        control={control}
        name="note"
        label="Note (optional)"
        hint="E.g. new string, 20 twists, peep re-served"
        multiline
        testID="change-note"
      />
      {general ? (
        <Banner tone="error" title="Not logged">
          {general}
        </Banner>
      ) : null}
      <View style={styles.row}>
        <Button
          label="Log the change"
          pendingLabel="Logging…"
          pending={log.isPending}
          onPress={submit}
          style={styles.big}
          testID="change-submit"
        />
        {onCancel ? <Button label="Cancel" variant="secondary" onPress={onCancel} style={styles.big} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 150 },
  big: { minHeight: bigTap },
});
