import { useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { useUnits } from '@/components/account/use-units';
import { useSaveBow } from '@/components/bows/api';
import { bowFormDefaults, bowFormFields, bowFormSchema, type BowFormText } from '@/components/bows/bow-form-values';
import { FieldGrid } from '@/components/forms/field-grid';
import { applyFieldErrors, flatFieldPath } from '@/components/forms/server-field-errors';
import { textFormResolver } from '@/components/forms/text-form-resolver';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { FormChoice } from '@/components/ui/form-choice';
import { FormField } from '@/components/ui/form-field';
import { SectionHeading } from '@/components/ui/section-heading';
import { space } from '@/components/theme';
import type { DistanceUnit, LengthUnit } from '@/shared/auth';
import type { Bow, BowInput } from '@/shared/bow';
import { shownUnit, type UnitsLike } from '@/shared/units';

export interface BowFormProps {
  /** The bow to edit; absent for a new bow. */
  bow?: Bow;
  /** The archer's length unit: lengths are typed in it and stored in mm. */
  lengthUnit: LengthUnit;
  /** The archer's distance unit (a new bow's pin distances start in it). */
  distanceUnit: DistanceUnit;
  /** Called with the saved bow. */
  onSaved: (bow: Bow) => void;
  onCancel: () => void;
}

const handOptions = [
  { value: 'right', label: 'Right hand' },
  { value: 'left', label: 'Left hand' },
] as const;
const sightKindOptions = [
  { value: 'single-pin-slider', label: 'Single-pin slider' },
  { value: 'fixed-multi-pin', label: 'Fixed multi-pin' },
  { value: 'hybrid', label: 'Hybrid' },
] as const;
const scaleOptions = [
  { value: 'down', label: 'Grows downward' },
  { value: 'up', label: 'Grows upward' },
] as const;
const distanceOptions = [
  { value: 'yd', label: 'Yards' },
  { value: 'm', label: 'Metres' },
] as const;

/**
 * The bow's set-up: draw, sight and peep measurements, typed in the archer's
 * unit and checked with the shared bow schema before anything is sent. A save
 * is one request; an edit sends only the fields that changed.
 * Example: `<BowForm lengthUnit="mm" distanceUnit="yd" onSaved={(bow) => router.replace(`/bows/${bow.id}`)} onCancel={router.back} />`
 */
export function BowForm({ bow, lengthUnit, distanceUnit, onSaved, onCancel }: BowFormProps) {
  const save = useSaveBow();
  const me = useUnits();
  const [general, setGeneral] = useState<string | null>(null);
  // The account's speed choice beside the length unit the screen passes (altitude left out: pin distances may be in metres).
  const speedUnit = me?.speedUnit;
  const units = useMemo<UnitsLike>(() => ({ lengthUnit, speedUnit }), [lengthUnit, speedUnit]);
  const resolver = useMemo(
    () => textFormResolver<BowFormText, BowInput>(bowFormSchema(units), { units, flatten: ['pinDistances'] }),
    [units],
  );
  const { control, handleSubmit, setError, formState } = useForm<BowFormText, unknown, BowInput>({
    resolver,
    defaultValues: bowFormDefaults(bow, units, distanceUnit),
  });
  // Read in render: react-hook-form tracks dirty fields only for a formState that is read.
  const { dirtyFields } = formState;
  const sightKind = useWatch({ control, name: 'sightKind' });
  const unit = lengthUnit;
  const lengthHint = unit === 'in' ? 'inches' : 'millimetres';

  const submit = handleSubmit(
    (input) => {
      setGeneral(null);
      // An edit sends only what changed, so an untouched length is not re-rounded through inches.
      const body = bow
        ? Object.fromEntries(
            Object.entries(input).filter(
              ([key]) => dirtyFields[key as keyof BowFormText] || (key === 'pinDistances' && dirtyFields.sightKind),
            ),
          )
        : input;
      save.mutate(
        { id: bow?.id, input: body },
        {
          onSuccess: onSaved,
          onError: (error) => setGeneral(applyFieldErrors(error, flatFieldPath(bowFormFields), setError)),
        },
      );
    },
    () => setGeneral('Some fields need another look; nothing was saved.'),
  );

  return (
    <View style={styles.form}>
      {general ? (
        <Banner tone="error" title={bow ? 'Could not save the bow' : 'Could not add the bow'} testID="bow-form-error">
          {general}
        </Banner>
      ) : null}

      <Card style={styles.section}>
        <SectionHeading title="The bow" />
        <FieldGrid>
          <FormField
            control={control}
            name="nickname"
            label="Nickname"
            hint="Your own name for it, e.g. “Elk slider”."
            autoCapitalize="words"
          />
          <FormChoice control={control} name="hand" label="Hand" options={handOptions} />
        </FieldGrid>
        <FieldGrid minWidth={160}>
          <FormField control={control} name="drawWeightLb" label="Draw weight" hint="Peak weight" unit="lb" numeric />
          <FormField control={control} name="drawLengthMm" label="Draw length" hint="As the bow is set" unit={unit} numeric />
          <FormField control={control} name="letOffPct" label="Let-off" hint="Optional" unit="%" numeric />
          <FormField control={control} name="ratedSpeedFps" label="Rated speed" hint="Optional" unit={shownUnit('speed', units)} numeric />
        </FieldGrid>
      </Card>

      <Card style={styles.section}>
        <SectionHeading title="The sight" description={`Lengths in ${lengthHint}; change the unit on your account page.`} />
        <FormField
          control={control}
          name="sightDescription"
          label="Sight description"
          hint="Optional, in your words: housing, scale, pin size."
        />
        <FormChoice control={control} name="sightKind" label="Kind of sight" options={sightKindOptions} />
        <FieldGrid>
          <FormField
            control={control}
            name="sightRadiusMm"
            label="Sight radius"
            hint="At full draw, from the centre of the peep to the pin, along the arrow. Have a helper measure while you hold with an arrow nocked, aimed at a safe backstop."
            unit={unit}
            numeric
          />
          <FormField
            control={control}
            name="peepHeightMm"
            label="Peep height"
            hint="From the centre of the peep to the centre of the nocked arrow, along the string, with the bow at rest. The fit refines it from a short mark."
            unit={unit}
            numeric
          />
        </FieldGrid>
        <FieldGrid>
          <FormChoice
            control={control}
            name="scaleDirection"
            label="Scale readings"
            hint="Most scales read larger as the pin moves down."
            options={scaleOptions}
          />
          <FormField control={control} name="tapeWidthMm" label="Tape width" hint="The window the tape sits in." unit={unit} numeric />
        </FieldGrid>
        {sightKind !== 'single-pin-slider' ? (
          <FieldGrid>
            <FormField
              control={control}
              name="pinDistances"
              label="Pin distances"
              hint="The distance each fixed pin is set for, separated by commas, e.g. 20, 30, 40, 50."
              inputMode="decimal"
              testID="pin-distances"
            />
            <FormChoice control={control} name="pinDistanceUnit" label="Pins set in" options={distanceOptions} />
          </FieldGrid>
        ) : null}
      </Card>

      <Card style={styles.section}>
        <FormField
          control={control}
          name="notes"
          label="Notes"
          hint="Optional: string, rest, anything you will want to remember."
          multiline
          numberOfLines={4}
        />
      </Card>

      <View style={styles.actions}>
        <Button
          label={bow ? 'Save the bow' : 'Add the bow'}
          pendingLabel="Saving…"
          pending={save.isPending}
          onPress={submit}
          testID="bow-save"
        />
        <Button label="Cancel" variant="secondary" onPress={onCancel} disabled={save.isPending} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.xl },
  section: { gap: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
