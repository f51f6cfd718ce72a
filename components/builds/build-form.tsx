import { useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { useUnits } from '@/components/account/use-units';
import { FieldGrid } from '@/components/forms/field-grid';
import { applyFieldErrors, flatFieldPath } from '@/components/forms/server-field-errors';
import { textFormResolver } from '@/components/forms/text-form-resolver';
import { useSaveBuild } from '@/components/builds/api';
import { buildFormDefaults, buildFormFields, buildFormSchema, type BuildFormText } from '@/components/builds/build-form-values';
import { BuildTotals, BuildTotalsStrip } from '@/components/builds/build-totals';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { FormField } from '@/components/ui/form-field';
import { SectionHeading } from '@/components/ui/section-heading';
import { useWide } from '@/components/ui/use-wide';
import { space } from '@/components/theme';
import type { LengthUnit } from '@/shared/auth';
import type { Build, BuildInput } from '@/shared/build';
import { shownUnit, type UnitsLike } from '@/shared/units';

export interface BuildFormProps {
  /** The bow the build belongs to (new builds). */
  bowId: number;
  /** The build to edit; absent for a new one. */
  build?: Build;
  lengthUnit: LengthUnit;
  onSaved: (build: Build) => void;
  onCancel: () => void;
  /** Show the build without letting it change (a technician on a shared bow): inputs disabled, no Save. */
  readOnly?: boolean;
}

/**
 * An arrow build's components, with total grains, FOC, kinetic energy and
 * momentum worked out by the math core as the archer types. Checked with the
 * shared build schema before anything is sent; saved in one request.
 * Example: `<BuildForm bowId={3} lengthUnit="in" onSaved={(build) => router.replace(`/builds/${build.id}`)} onCancel={router.back} />`
 */
export function BuildForm({ bowId, build, lengthUnit, onSaved, onCancel, readOnly = false }: BuildFormProps) {
  const save = useSaveBuild();
  const wide = useWide();
  const me = useUnits();
  const [general, setGeneral] = useState<string | null>(null);
  // The account's speed and mass choices beside the length unit the screen passes.
  const { speedUnit, massUnit } = me ?? {};
  const units = useMemo<UnitsLike>(() => ({ lengthUnit, speedUnit, massUnit }), [lengthUnit, speedUnit, massUnit]);
  const resolver = useMemo(() => textFormResolver<BuildFormText, BuildInput>(buildFormSchema(units), { units }), [units]);
  const { control, handleSubmit, setError } = useForm<BuildFormText, unknown, BuildInput>({
    resolver,
    defaultValues: buildFormDefaults(build, units),
  });
  const text = useWatch({ control }) as BuildFormText;
  const unit = lengthUnit;
  const mass = shownUnit('mass', units);

  const submit = handleSubmit(
    (input) => {
      setGeneral(null);
      save.mutate(
        { id: build?.id, bowId, input },
        {
          onSuccess: onSaved,
          onError: (error) => setGeneral(applyFieldErrors(error, flatFieldPath(buildFormFields), setError)),
        },
      );
    },
    () => setGeneral('Some fields need another look; nothing was saved.'),
  );

  const fields = (
    <View style={styles.fields}>
      <Card style={styles.section}>
        <SectionHeading title="Name and shaft" />
        <FieldGrid>
          <FormField
            control={control}
            disabled={readOnly}
            name="name"
            label="Build name"
            hint="e.g. “Heavy elk arrows”"
            autoCapitalize="sentences"
          />
          <FormField
            control={control}
            disabled={readOnly}
            name="shaftLabel"
            label="Shaft label"
            hint="Optional: what the shaft says on it, in your words."
          />
        </FieldGrid>
        <FieldGrid minWidth={120}>
          <FormField control={control} disabled={readOnly} name="spine" label="Spine" hint="Optional" numeric />
          <FormField
            control={control}
            disabled={readOnly}
            name="grainsPerInch"
            label="Grains per inch"
            hint="Bare shaft"
            unit="gpi"
            numeric
          />
          <FormField
            control={control}
            disabled={readOnly}
            name="cutLengthMm"
            label="Cut length"
            hint="From the nock throat"
            unit={unit}
            numeric
          />
          <FormField control={control} disabled={readOnly} name="diameterMm" label="Diameter" hint="Shaft outside" unit={unit} numeric />
        </FieldGrid>
      </Card>

      <Card style={styles.section}>
        <SectionHeading
          title="Components"
          description={`Weights in ${mass === 'g' ? 'grams' : 'grains'}. Leave a part you do not use empty.`}
        />
        <FieldGrid minWidth={120}>
          <FormField control={control} disabled={readOnly} name="pointGr" label="Point" hint="Or broadhead" unit={mass} numeric />
          <FormField control={control} disabled={readOnly} name="insertGr" label="Insert" hint="If any" unit={mass} numeric />
          <FormField control={control} disabled={readOnly} name="collarGr" label="Collar" hint="If any" unit={mass} numeric />
          <FormField control={control} disabled={readOnly} name="nockGr" label="Nock" hint="With its bushing" unit={mass} numeric />
        </FieldGrid>
        <FieldGrid minWidth={150}>
          <FormField control={control} disabled={readOnly} name="vaneCount" label="Vanes" hint="How many" numeric />
          <FormField control={control} disabled={readOnly} name="vaneWeightGr" label="Each vane" hint="One vane" unit={mass} numeric />
          <FormField control={control} disabled={readOnly} name="wrapGr" label="Wrap" hint="If any" unit={mass} numeric />
        </FieldGrid>
      </Card>

      <Card style={styles.section}>
        <SectionHeading title="Measured" description="Optional, but each one sharpens the numbers." />
        <FieldGrid minWidth={180}>
          <FormField
            control={control}
            disabled={readOnly}
            name="balancePointMm"
            label="Balance point"
            hint="From the nock throat, with the point on. Gives FOC."
            unit={unit}
            numeric
          />
          <FormField
            control={control}
            disabled={readOnly}
            name="speedFps"
            label="Chronographed speed"
            hint="From this bow. Gives energy."
            unit={shownUnit('speed', units)}
            numeric
          />
          <FormField
            control={control}
            disabled={readOnly}
            name="dragCoefficient"
            label="Drag coefficient"
            hint="Empty: the default, 2.0"
            numeric
          />
        </FieldGrid>
      </Card>
    </View>
  );

  const totals = <BuildTotals text={text} lengthUnit={units} />;

  return (
    <View style={styles.form}>
      {general ? (
        <Banner tone="error" title={build ? 'Could not save the build' : 'Could not add the build'} testID="build-form-error">
          {general}
        </Banner>
      ) : null}
      {wide ? (
        <View style={styles.split}>
          <View style={styles.main}>{fields}</View>
          <View style={styles.side}>{totals}</View>
        </View>
      ) : (
        <>
          <BuildTotalsStrip text={text} lengthUnit={units} />
          {fields}
          {totals}
        </>
      )}
      {readOnly ? null : (
        <View style={styles.actions}>
          <Button
            label={build ? 'Save the build' : 'Add the build'}
            pendingLabel="Saving…"
            pending={save.isPending}
            onPress={submit}
            testID="build-save"
          />
          <Button label="Cancel" variant="secondary" onPress={onCancel} disabled={save.isPending} />
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.xl },
  fields: { gap: space.xl },
  section: { gap: space.lg },
  split: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  main: { flex: 1, minWidth: 0 },
  side: { width: 300, position: 'sticky' as never, top: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
