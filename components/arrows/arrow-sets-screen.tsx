import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useAddArrowSet, useAddFlier, useArrowSets, useUpdateArrow } from '@/components/arrows/api';
import { useMe } from '@/components/auth/api';
import { useBow } from '@/components/bows/api';
import { formatDay } from '@/components/bows/readiness-words';
import { messageForUnits, quantityTextToStored, storedToInputText, textToNumber } from '@/components/forms/form-numbers';
import { useUnits } from '@/components/account/use-units';
import { useBuild } from '@/components/builds/api';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ErrorView } from '@/components/ui/error-view';
import { PlusIcon } from '@/components/ui/icons';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { TextField } from '@/components/ui/text-field';
import { Text } from '@/components/ui/text';
import { colors, radii, space } from '@/components/theme';
import { arrowSetInputSchema, arrowStatusNames, type Arrow, type ArrowSet, type SpinKind } from '@/shared/arrow-set';
import { arrowSetStats, buildWeightCheck, defaultToleranceGr } from '@/shared/arrow-set-stats';
import type { BowDetail } from '@/shared/bow-detail';
import { fromStored, shownUnit, type UnitsLike } from '@/shared/units';

/** Decimals for arrow weights: 0.1 gr, 0.01 g (a grain is about 0.065 g). */
const massDigits = (units: UnitsLike) => (shownUnit('mass', units) === 'g' ? 2 : 1);
/** A weight stored in grains, in the archer's mass unit: "500.2 gr" or "32.41 g". */
const gr = (value: number, units: UnitsLike) =>
  `${Number(fromStored(value, 'mass', units).toFixed(massDigits(units)))} ${shownUnit('mass', units)}`;
/** "+0.4 gr", "−0.3 gr", "±0 gr" (rounded first, so −0.04 gr reads ±0). */
const signedGr = (value: number, units: UnitsLike) => {
  const rounded = Number(fromStored(value, 'mass', units).toFixed(massDigits(units)));
  return `${rounded > 0 ? '+' : rounded < 0 ? '−' : '±'}${Math.abs(rounded)} ${shownUnit('mass', units)}`;
};

function spinWords(arrow: Arrow): string {
  if (arrow.spinKind === 'thou') return `runout ${arrow.runout} thou`;
  if (arrow.spinKind === 'mm') return `runout ${arrow.runout} mm`;
  if (arrow.spinKind === 'pass') return 'spin: pass';
  if (arrow.spinKind === 'fail') return 'spin: FAIL';
  return 'not spun';
}

function SetCard({ set, bow, canChange, canAdd }: { set: ArrowSet; bow: BowDetail; canChange: boolean; canAdd: boolean }) {
  const update = useUpdateArrow(set.buildId);
  const flier = useAddFlier(set.buildId);
  const units = useUnits();
  const stats = arrowSetStats(
    set.arrows.filter((a) => a.status !== 'retired'),
    set.toleranceGr,
  );
  const check = buildWeightCheck(stats.medianGr, set.buildTotalGr, set.toleranceGr);
  const flagOf = (arrow: Arrow) => stats.flags.find((flag) => flag.number === arrow.number);
  const sightIns = bow.sightIns.filter((s) => s.buildId === set.buildId);
  const latestSightIn = sightIns[0] ?? null;
  return (
    <View style={styles.card} testID={`arrow-set-${set.id}`}>
      <Text variant="title">{set.name}</Text>
      <Text variant="small" tone="soft">
        Tolerance ±{gr(set.toleranceGr, units)} around the median{set.byTechnician ? ` · added by ${set.addedBy.name}` : ''} ·{' '}
        {formatDay(set.createdAt)}
      </Text>
      <View style={styles.figures}>
        <Figure label="Median" value={stats.medianGr === null ? '—' : gr(stats.medianGr, units)} testID={`set-${set.id}-median`} />
        <Figure label="Spread" value={stats.spreadGr === null ? '—' : gr(stats.spreadGr, units)} testID={`set-${set.id}-spread`} />
        <Figure label="Outside ±tolerance" value={String(stats.flags.length)} testID={`set-${set.id}-flag-count`} />
      </View>
      {check ? (
        <Text variant="small" tone={check.outside ? 'due' : 'soft'} testID={`set-${set.id}-build-check`}>
          The build’s computed total is {gr(set.buildTotalGr!, units)}; the set’s median is {signedGr(check.differenceGr, units)} from it
          {check.outside ? ': re-weigh a component, or correct the build.' : '.'}
        </Text>
      ) : null}
      <Text variant="caption" tone="soft">
        Retired arrows are left out of the figures. ±{gr(defaultToleranceGr, units)} is the usual default (common practice, no published
        source).
      </Text>
      <View accessibilityLabel={`Arrows of ${set.name}`}>
        {set.arrows.map((arrow) => {
          const flag = arrow.status === 'retired' ? undefined : flagOf(arrow);
          const off = stats.medianGr === null ? null : arrow.weightGr - stats.medianGr;
          return (
            <View key={arrow.id} style={[styles.arrowRow, flag && styles.flagged]} testID={`arrow-${set.id}-${arrow.number}`}>
              <View style={styles.arrowMain}>
                <Text variant="label" style={styles.number}>
                  #{arrow.number}
                </Text>
                <Text style={styles.weight}>{gr(arrow.weightGr, units)}</Text>
                <Text variant="small" style={styles.off}>
                  {off === null ? '' : signedGr(off, units)}
                </Text>
                <Text
                  variant="label"
                  tone={flag ? 'failed' : 'verified'}
                  style={styles.flag}
                  testID={`arrow-${set.id}-${arrow.number}-flag`}
                >
                  {flag ? (flag.side === 'heavy' ? 'Heavy' : 'Light') : arrow.status === 'retired' ? '—' : 'In'}
                </Text>
              </View>
              <Text variant="small" tone="soft" style={styles.status}>
                {spinWords(arrow)} · {arrowStatusNames[arrow.status]}
                {arrow.fliers.length ? ` · flew out ${arrow.fliers.length}×` : ''}
                {arrow.note ? ` · ${arrow.note}` : ''}
              </Text>
              {canChange && arrow.status !== 'retired' ? (
                <Button
                  label="Retire"
                  variant="quiet"
                  onPress={() => update.mutate({ arrowId: arrow.id, update: { status: 'retired' } })}
                  testID={`retire-${set.id}-${arrow.number}`}
                />
              ) : null}
              {canAdd && latestSightIn && !arrow.fliers.some((f) => f.sightInId === latestSightIn.id) ? (
                <Button
                  label="Flew out"
                  variant="quiet"
                  accessibilityLabel={`Arrow ${arrow.number} flew out of the group at the sight-in of ${formatDay(latestSightIn.date)}`}
                  onPress={() => flier.mutate({ arrowId: arrow.id, sightInId: latestSightIn.id })}
                  testID={`flier-${set.id}-${arrow.number}`}
                />
              ) : null}
            </View>
          );
        })}
      </View>
      {latestSightIn && canAdd ? (
        <Text variant="caption" tone="soft">
          “Flew out” counts the arrow against the latest sight-in of this build ({formatDay(latestSightIn.date)}).
        </Text>
      ) : null}
      {update.isError ? <Text tone="failed">{update.error.message}</Text> : null}
      {flier.isError ? <Text tone="failed">{flier.error.message}</Text> : null}
    </View>
  );
}

function Figure({ label, value, testID }: { label: string; value: string; testID?: string }) {
  return (
    <View style={styles.figure}>
      <Text variant="caption" tone="soft">
        {label}
      </Text>
      <Text variant="title" testID={testID}>
        {value}
      </Text>
    </View>
  );
}

const spinOptions: { value: SpinKind; label: string }[] = [
  { value: 'none', label: 'Not spun' },
  { value: 'thou', label: 'Thousandths (in)' },
  { value: 'mm', label: 'mm' },
  { value: 'pass', label: 'Pass / fail' },
];

type Row = { weight: string; spin: string; note: string };
const emptyRows = (count: number): Row[] => Array.from({ length: count }, () => ({ weight: '', spin: '', note: '' }));

function NewSetForm({ buildId, onDone }: { buildId: number; onDone: () => void }) {
  const add = useAddArrowSet(buildId);
  // Weights and the tolerance are typed in the archer's mass unit (gr or g; "32.4 g" in a grain field works too), stored in grains.
  const units = useUnits();
  const massUnit = shownUnit('mass', units);
  const [name, setName] = useState('Hunting set');
  const [tolerance, setTolerance] = useState(storedToInputText(defaultToleranceGr, 'mass', units));
  const [spinKind, setSpinKind] = useState<SpinKind>('none');
  const [rows, setRows] = useState<Row[]>(emptyRows(6));
  const [errors, setErrors] = useState<Record<string, string>>({});

  const setRow = (index: number, patch: Partial<Row>) => setRows((all) => all.map((row, i) => (i === index ? { ...row, ...patch } : row)));
  const submit = () => {
    const arrows = rows.map((row, index) => {
      const spinText = row.spin.trim().toLowerCase();
      const kind: SpinKind =
        spinKind === 'pass'
          ? spinText === 'fail' || spinText === 'f'
            ? 'fail'
            : spinText === ''
              ? 'none'
              : 'pass'
          : spinText === ''
            ? 'none'
            : spinKind;
      return {
        number: index + 1,
        weightGr: quantityTextToStored(row.weight, 'mass', units),
        spinKind: kind,
        runout: kind === 'thou' || kind === 'mm' ? (textToNumber(row.spin) ?? null) : null,
        note: row.note,
        status: 'quiver' as const,
      };
    });
    const parsed = arrowSetInputSchema.safeParse({ name, toleranceGr: quantityTextToStored(tolerance, 'mass', units), arrows });
    if (!parsed.success) {
      const next: Record<string, string> = {};
      for (const issue of parsed.error.issues) {
        const key = issue.path.join('.');
        const message = messageForUnits(issue.message, units, ['mass']);
        if (!next[key])
          next[key] = issue.path[0] === 'arrows' && typeof issue.path[1] === 'number' ? `Arrow ${issue.path[1] + 1}: ${message}` : message;
      }
      setErrors(next);
      return;
    }
    setErrors({});
    add.mutate(parsed.data, {
      onSuccess: onDone,
      onError: (error) => setErrors({ ...error.fields, form: Object.keys(error.fields).length ? '' : error.message }),
    });
  };
  const rowError = (index: number, field: string) => errors[`arrows.${index}.${field}`];
  const listed = Object.entries(errors).filter(([key, value]) => key !== 'form' && value);
  return (
    <View style={styles.card} testID="new-arrow-set">
      <Text variant="title">New arrow set</Text>
      <View style={styles.row}>
        <View style={styles.cellWide}>
          <TextField label="Set name" value={name} onChangeText={setName} error={errors.name} testID="set-name" />
        </View>
        <View style={styles.cell}>
          <TextField
            label={`Tolerance (${massUnit})`}
            hint="± around the median"
            numeric
            unit={massUnit}
            value={tolerance}
            onChangeText={setTolerance}
            error={errors.toleranceGr}
            testID="set-tolerance"
          />
        </View>
      </View>
      <SegmentedControl
        label="Spin check given as"
        options={spinOptions}
        value={spinKind}
        onChange={setSpinKind}
        optionBasis={120}
        testID="set-spin-kind"
      />
      {rows.map((row, index) => (
        <View key={index} style={styles.row} testID={`new-arrow-${index + 1}`}>
          <Text variant="label" style={styles.rowNumber}>
            #{index + 1}
          </Text>
          <View style={styles.cell}>
            <TextField
              label={`Arrow ${index + 1} weight (${massUnit})`}
              numeric
              unit={massUnit}
              value={row.weight}
              onChangeText={(weight) => setRow(index, { weight })}
              error={rowError(index, 'weightGr')}
              testID={`arrow-weight-${index + 1}`}
            />
          </View>
          {spinKind !== 'none' ? (
            <View style={styles.cell}>
              <TextField
                label={spinKind === 'pass' ? 'Spin (pass / fail)' : `Runout (${spinKind === 'thou' ? 'thou' : 'mm'})`}
                value={row.spin}
                onChangeText={(spin) => setRow(index, { spin })}
                error={rowError(index, 'runout')}
                testID={`arrow-spin-${index + 1}`}
              />
            </View>
          ) : null}
          <View style={styles.cellWide}>
            <TextField
              label="Nock or vane note"
              value={row.note}
              onChangeText={(note) => setRow(index, { note })}
              error={rowError(index, 'note')}
              testID={`arrow-note-${index + 1}`}
            />
          </View>
        </View>
      ))}
      <View style={styles.row}>
        <Button
          label="Add an arrow"
          icon={PlusIcon}
          variant="secondary"
          disabled={rows.length >= 48}
          onPress={() => setRows((all) => [...all, ...emptyRows(1)])}
          testID="add-arrow-row"
        />
        {rows.length > 1 ? <Button label="Remove the last" variant="quiet" onPress={() => setRows((all) => all.slice(0, -1))} /> : null}
      </View>
      {listed.length > 0 || errors.form ? (
        <Banner tone="error" title="Not saved" testID="set-errors">
          {errors.form || listed.map(([, value]) => value).join(' · ')}
        </Banner>
      ) : null}
      <View style={styles.row}>
        <Button label="Save the set" pendingLabel="Saving…" pending={add.isPending} onPress={submit} testID="save-set" />
        <Button label="Cancel" variant="secondary" onPress={onDone} />
      </View>
    </View>
  );
}

/**
 * A build's numbered arrow sets: each arrow's weight against the set's median
 * (flagged outside the tolerance), spin check, status and how often it flew
 * out of the group; the set's median against the build's computed total.
 * Example: `<ArrowSetsScreen buildId={7} />`
 */
export function ArrowSetsScreen({ buildId }: { buildId: number }) {
  const me = useMe();
  const build = useBuild(buildId);
  const bow = useBow(build.data?.bowId);
  const sets = useArrowSets(buildId);
  const [adding, setAdding] = useState(false);
  if (!Number.isInteger(buildId) || buildId <= 0) return <NotFoundScreen />;
  const failed = build.error ?? bow.error ?? sets.error;
  if (failed) {
    return (
      <>
        <ScreenTitle name="Arrow sets" />
        <ErrorView
          title="The arrow sets could not be loaded"
          error={failed}
          onRetry={() => Promise.all([build.refetch(), sets.refetch()])}
          retrying={build.isFetching || sets.isFetching}
        />
      </>
    );
  }
  if (!build.data || !bow.data || !sets.data || !me.data) {
    return (
      <>
        <ScreenTitle name="Arrow sets" />
        <LoadingView label="Loading the arrow sets…" />
      </>
    );
  }
  const meId = me.data.id;
  const isOwner = bow.data.userId === meId;
  return (
    <Screen testID="arrow-sets-screen">
      <ScreenTitle name={`Arrow sets · ${build.data.name}`} />
      <SectionHeading
        level={1}
        title="Arrow sets"
        description={`${build.data.name} · ${bow.data.nickname}`}
        action={<Button label="Tuning" variant="quiet" href={`/bows/${bow.data.id}/tuning`} />}
      />
      {sets.data.length === 0 && !adding ? <Text tone="soft">No arrow sets yet. Weigh each arrow, number it, and add the set.</Text> : null}
      {sets.data.map((set) => (
        <SetCard key={set.id} set={set} bow={bow.data} canChange={isOwner || set.addedBy.id === meId} canAdd />
      ))}
      {adding ? (
        <NewSetForm buildId={buildId} onDone={() => setAdding(false)} />
      ) : (
        <Button label="Add an arrow set" icon={PlusIcon} onPress={() => setAdding(true)} testID="add-arrow-set" />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  card: {
    gap: space.md,
    padding: space.lg,
    borderRadius: radii.lg,
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
  },
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xl },
  figure: { gap: space.xxs },
  arrowRow: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    columnGap: space.md,
    paddingVertical: space.xs,
    paddingHorizontal: space.sm,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
  arrowMain: { flexDirection: 'row', alignItems: 'center', gap: space.md, flexBasis: 280, flexGrow: 1 },
  flagged: { backgroundColor: colors.failedTint },
  number: { width: 36 },
  weight: { width: 80 },
  off: { width: 64 },
  flag: { width: 52 },
  status: { flexBasis: 200, flexGrow: 1 },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'flex-end' },
  rowNumber: { width: 32, paddingBottom: space.md },
  cell: { flexBasis: 130, flexGrow: 1 },
  cellWide: { flexBasis: 200, flexGrow: 2 },
});
