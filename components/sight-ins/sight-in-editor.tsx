import { useRouter } from 'expo-router';
import { useCallback, useDeferredValue, useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { StyleSheet, useWindowDimensions, View } from 'react-native';

import { useUnits } from '@/components/account/use-units';
import { FieldGrid } from '@/components/forms/field-grid';
import { applyFieldErrors } from '@/components/forms/server-field-errors';
import { buildLine } from '@/components/builds/build-words';
import { FitChart } from '@/components/sight-ins/fit-chart';
import { FitStrip, FitWarnings } from '@/components/sight-ins/fit-warnings';
import { liveFit, type LiveFit, type LiveFitText } from '@/components/sight-ins/live-fit';
import { MarkTable, type RowFit } from '@/components/sight-ins/mark-table';
import { PredictedMarks } from '@/components/sight-ins/predicted-marks';
import { useDeleteSightIn, useSaveSightIn } from '@/components/sight-ins/api';
import { useOutbox, useOutboxSent } from '@/components/offline/use-outbox';
import type { OutboxSent } from '@/components/offline/outbox';
import { DateField } from '@/components/sight-ins/date-field';
import {
  airInStoredUnits,
  appendOnlyUpdate,
  liveFitInUnits,
  keptRows,
  sightInFormDefaults,
  sightInFormResolverFor,
  tablePath,
  type SightInFormText,
} from '@/components/sight-ins/sight-in-form-values';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmBar } from '@/components/ui/confirm-bar';
import { FormChoice } from '@/components/ui/form-choice';
import { FormField } from '@/components/ui/form-field';
import { SectionHeading } from '@/components/ui/section-heading';
import { Text } from '@/components/ui/text';
import { space } from '@/components/theme';
import type { DistanceUnit } from '@/shared/auth';
import type { BowDetail } from '@/shared/bow-detail';
import { checkMarks, type MarkCheckResult, type MarkProblem } from '@/shared/mark-checks';
import type { SightIn, SightInInput } from '@/shared/sight-in';
import { formatQuantity, shownUnit, storedToText } from '@/shared/units';

export interface SightInEditorProps {
  bow: BowDetail;
  /** The saved sight-in; absent for a new sight-in. */
  sightIn?: SightIn;
  /** A new sight-in's build (e.g. from ?build=); else the bow's first build. */
  initialBuildId?: number;
  distanceUnit: DistanceUnit;
  /**
   * The viewer may add but not change or delete (a technician on a shared bow,
   * see useBowRole): a saved sight-in's details and marks are shown read-only,
   * new marks can be added below them, and there is no Delete. Default false.
   */
  addOnly?: boolean;
}

/** Window width (px) from which the marks and the live fit sit side by side. */
const splitFrom = 1000;

const unitOptions = [
  { value: 'yd', label: 'Yards' },
  { value: 'm', label: 'Metres' },
] as const;

/** The residual of each table row against the live fit, as the archer reads the scale. */
function rowFitsOf(live: LiveFit): Record<number, RowFit> {
  if (live.state !== 'fit') return {};
  const fits: Record<number, RowFit> = {};
  for (const mark of live.marks) {
    const residual = live.fit.residuals.find((item) => Math.abs(item.distance - mark.distance) < 1e-9);
    if (residual)
      fits[mark.row] = { fittedMm: live.sign * residual.fittedMm, residualMm: live.sign * residual.residualMm, outlier: residual.outlier };
  }
  return fits;
}

/** The table row a refusal names ("marks[1].distance" counts usable marks). */
function refusedRowOf(live: LiveFit): number | null {
  if (live.state !== 'refused') return null;
  const match = /^marks\[(\d+)\]/.exec(live.field);
  return match ? (live.marks[Number(match[1])]?.row ?? null) : null;
}

/** The form's text for the fit with each row that has a problem blanked (the fit leaves it out; row numbers stay). */
function withoutProblemRows(text: LiveFitText, checks: MarkCheckResult): LiveFitText {
  const flagged = new Set(checks.problems.map((problem) => problem.row));
  return {
    ...text,
    marks: (text.marks ?? []).map((row, index) => (flagged.has(index) ? { distance: '', scaleMm: '', arrowsShot: '', note: '' } : row)),
  };
}

function FitSummary({ live }: { live: Extract<LiveFit, { state: 'fit' }> }) {
  const { fit } = live;
  const units = useUnits();
  const figures = [
    { label: 'Arrow speed', value: formatQuantity(fit.speedFps, 'speed', units) },
    { label: 'Marks', value: String(fit.residuals.length) },
    {
      label: 'RMS off the fit',
      value: fit.method === 'one-mark' ? 'estimate (1 mark)' : fit.method === 'two-mark' ? 'exact (2 marks)' : `${fit.rmsMm.toFixed(2)} mm`,
    },
  ];
  return (
    <View style={styles.figures} testID="fit-summary">
      {figures.map((figure) => (
        <View key={figure.label} style={styles.figure}>
          <Text variant="small" tone="soft">
            {figure.label}
          </Text>
          <Text variant="numeralLarge" style={styles.figureValue}>
            {figure.value}
          </Text>
        </View>
      ))}
    </View>
  );
}

/**
 * A sight-in: the sight-in header, the marks table and, as the archer types,
 * the refit from the math core: predicted marks for the whole range with their
 * bands, warnings in plain words and charts. Saving sends the whole sight-in in
 * one request; the server refits and stores the fit. Messages from the server
 * go to the table row they concern.
 * Example: `<SightInEditor bow={bow} distanceUnit="yd" />`
 */
export function SightInEditor({ bow, sightIn, initialBuildId, distanceUnit, addOnly = false }: SightInEditorProps) {
  const router = useRouter();
  const save = useSaveSightIn();
  const remove = useDeleteSightIn();
  const { width } = useWindowDimensions();
  const split = width >= splitFrom;
  const [general, setGeneral] = useState<string | null>(null);
  const [asking, setAsking] = useState(false);
  // A technician keeps the archer's saved sight-in as it is and only adds marks to it.
  const keepSaved = addOnly && sightIn !== undefined;
  const lockedRows = keepSaved ? sightIn.marks.length : 0;
  const firstBuild = initialBuildId && bow.builds.some((build) => build.id === initialBuildId) ? initialBuildId : bow.builds[0]?.id;
  // Altitude and temperature are typed in the account's units (shared/units.ts) and stored in m and °C.
  const units = useUnits();
  const resolver = useMemo(() => sightInFormResolverFor(units), [units]);
  const { control, handleSubmit, setError, formState, reset } = useForm<SightInFormText, unknown, SightInInput>({
    resolver,
    defaultValues: sightInFormDefaults(sightIn, firstBuild, distanceUnit, units),
  });

  const [buildId, altitudeM, temperatureC, unit, marks] = useWatch({
    control,
    name: ['buildId', 'altitudeM', 'temperatureC', 'unit', 'marks'],
  });
  // The fit reruns on each keystroke; a deferred key lets typing stay ahead of it.
  const key = JSON.stringify({ buildId, ...airInStoredUnits({ altitudeM, temperatureC }, units), unit, marks });
  const deferredKey = useDeferredValue(key);
  // Each row checked as typed (shared/mark-checks); the fit leaves out the rows with a problem.
  const checks = useMemo(() => {
    const text = JSON.parse(deferredKey) as LiveFitText;
    const build = bow.builds.find((item) => String(item.id) === text.buildId);
    return checkMarks(text.marks ?? [], {
      unit: text.unit,
      scaleDirection: bow.scaleDirection,
      peepHeightMm: bow.peepHeightMm,
      speedFps: build?.speedFps ?? null,
    });
  }, [deferredKey, bow]);
  const live = useMemo(
    () => liveFitInUnits(liveFit(withoutProblemRows(JSON.parse(deferredKey) as LiveFitText, checks), bow, bow.builds), units),
    [deferredKey, bow, checks, units],
  );
  const problemsByRow = useMemo(
    () => Object.fromEntries(checks.problems.map((problem) => [problem.row, problem])) as Record<number, MarkProblem>,
    [checks],
  );
  // A save made with no signal is kept on this phone (components/offline) until it is sent.
  const [keptId, setKeptId] = useState<string | null>(null);
  const [keptItem] = useOutbox({ ids: keptId ? [keptId] : [] });
  const [askFalling, setAskFalling] = useState(false);
  const onSent = useCallback(
    (sent: OutboxSent) => {
      if (sent.id !== keptId) return;
      setKeptId(null);
      const saved = (sent.response as { sightIn?: SightIn } | null)?.sightIn;
      if (!sightIn && saved) router.replace(`/sight-ins/${saved.id}`);
      else reset(undefined, { keepValues: true });
    },
    [keptId, sightIn, router, reset],
  );
  useOutboxSent(onSent);
  const rowFits = useMemo(() => rowFitsOf(live), [live]);

  const buildOptions = bow.builds.map((build) => ({ value: String(build.id), label: build.name }));
  const chosen = bow.builds.find((build) => String(build.id) === buildId);

  // `fallingOk`: the archer has confirmed a reading that falls with distance.
  const submit = (fallingOk: boolean) =>
    handleSubmit(
      (input) => {
        setGeneral(null);
        // A reading that falls with distance is most often a typo: the archer confirms it before it is saved.
        if (checks.falling.length > 0 && !fallingOk) {
          setAskFalling(true);
          return;
        }
        setAskFalling(false);
        const kept = keptRows(marks ?? []);
        save.mutate(
          {
            id: sightIn?.id,
            bowId: bow.id,
            input: keepSaved ? appendOnlyUpdate(sightIn, input) : input,
            title: sightIn
              ? `New marks for the ${sightIn.date} sight-in · ${bow.nickname}`
              : `New sight-in · ${bow.nickname} · ${input.marks.length} marks`,
            outboxId: keptItem?.state === 'waiting' ? keptItem.id : undefined,
          },
          {
            onSuccess: (result) => {
              if (result.kept) {
                setKeptId(result.item.id);
                return;
              }
              setKeptId(null);
              const saved = result.sightIn;
              if (sightIn) reset(sightInFormDefaults(saved, undefined, distanceUnit, units));
              else router.replace(`/sight-ins/${saved.id}`);
            },
            onError: (error) =>
              setGeneral(
                applyFieldErrors(
                  error,
                  (field) => {
                    const parts = field.split('.').map((part) => (/^\d+$/.test(part) ? Number(part) : part));
                    const known = ['buildId', 'date', 'placeLabel', 'altitudeM', 'temperatureC', 'notes', 'marks'];
                    return known.includes(String(parts[0])) ? tablePath(parts, kept) : null;
                  },
                  setError,
                ),
              ),
          },
        );
      },
      () => setGeneral('Some fields need another look; nothing was saved.'),
    )();

  const header = (
    <Card style={styles.section}>
      <SectionHeading title="The sight-in" />
      {buildOptions.length > 0 ? (
        <FormChoice
          control={control}
          name="buildId"
          label="Arrow build"
          options={buildOptions}
          disabled={keepSaved}
          testID="sight-in-build"
        />
      ) : null}
      {chosen ? (
        <Text variant="small" tone="soft">
          {buildLine(chosen.derived, chosen.speedFps, units)} ·{' '}
          {storedToText(chosen.diameterMm, 'length', units, shownUnit('length', units) === 'in' ? 3 : 1)} {shownUnit('length', units)} shaft
        </Text>
      ) : null}
      <FieldGrid minWidth={170}>
        <DateField control={control} name="date" label="Date" disabled={keepSaved} testID="sight-in-date" />
        <FormField control={control} name="placeLabel" label="Place" hint="Optional, e.g. “home range”" disabled={keepSaved} />
      </FieldGrid>
      <FieldGrid minWidth={140}>
        <FormField
          control={control}
          name="altitudeM"
          label="Altitude"
          hint="Optional"
          unit={shownUnit('altitude', units)}
          numeric
          disabled={keepSaved}
          testID="sight-in-altitude"
        />
        <FormField
          control={control}
          name="temperatureC"
          label="Temperature"
          hint="Optional"
          unit={shownUnit('temperature', units)}
          numeric
          disabled={keepSaved}
          testID="sight-in-temperature"
        />
      </FieldGrid>
      <FormChoice control={control} name="unit" label="Distances in" options={unitOptions} disabled={keepSaved} testID="sight-in-unit" />
    </Card>
  );

  const table = (
    <Card style={styles.section}>
      <SectionHeading title="Marks" description="The scale reading where your group landed centred, for each distance." />
      {keepSaved ? (
        <Text variant="small" tone="soft" testID="marks-add-only">
          {`The saved marks and the sight-in’s details are ${bow.ownerName || 'the archer'}’s: you can add marks below them.`}
        </Text>
      ) : null}
      <MarkTable
        control={control}
        unit={unit}
        rowFits={rowFits}
        refusedRow={refusedRowOf(live)}
        lockedRows={lockedRows}
        problems={problemsByRow}
      />
      <FormField
        control={control}
        name="notes"
        label="Sight-in notes"
        hint="Optional: wind, light, anything odd."
        multiline
        numberOfLines={3}
        disabled={keepSaved}
      />
    </Card>
  );

  const results = (
    <Card style={styles.section} testID="live-fit">
      <SectionHeading
        title="Live fit"
        description="Refitted as you type, with drag, from your marks and the bow's sight radius and peep height."
      />
      {live.state === 'waiting' ? <Text tone="soft">{live.message}</Text> : null}
      <FitWarnings live={live} checks={checks} />
      {live.state === 'fit' ? (
        <>
          <FitSummary live={live} />
          <PredictedMarks fit={live.fit} sign={live.sign} marks={live.marks} />
          <FitChart fit={live.fit} sign={live.sign} marks={live.marks} />
        </>
      ) : null}
    </Card>
  );

  // The question about a falling reading sits by the Save button the archer just pressed.
  const actions = (
    <View style={styles.actionsBlock}>
      {askFalling ? (
        <ConfirmBar
          title="Save a reading that falls with distance?"
          message={`${checks.falling
            .map((mark) => checks.problems.find((problem) => problem.row === mark.row)?.message)
            .filter(Boolean)
            .join(' ')} Save it only if you read the sight right.`}
          confirmLabel="Save it as it is"
          pendingLabel="Saving…"
          pending={save.isPending}
          error={null}
          onConfirm={() => void submit(true)}
          onCancel={() => setAskFalling(false)}
          testID="falling-confirm"
        />
      ) : null}
      <View style={styles.actions}>
        <Button
          label={sightIn ? 'Save the marks' : 'Save the sight-in'}
          pendingLabel="Saving…"
          pending={save.isPending}
          onPress={() => void submit(false)}
          testID="sight-in-save"
        />
        {sightIn ? (
          <Button label="Tape" variant="secondary" href={`/sight-ins/${sightIn.id}/tape`} disabled={formState.isDirty} testID="open-tape" />
        ) : null}
        <Button label="Back to the bow" variant="quiet" href={`/bows/${bow.id}`} />
      </View>
    </View>
  );

  return (
    <View style={styles.editor}>
      {general ? (
        <Banner tone="error" title="Could not save the sight-in" testID="sight-in-error">
          {general}
        </Banner>
      ) : null}
      {keptItem ? (
        <Banner
          tone={keptItem.state === 'refused' ? 'error' : 'warn'}
          title={keptItem.state === 'refused' ? 'The server refused this sight-in' : 'On this phone, not sent yet'}
          testID="sight-in-kept"
        >
          {keptItem.state === 'refused'
            ? `${keptItem.refusal?.message ?? 'It was refused.'} It stays on this phone (see the list at the top) until you copy or discard it.`
            : 'Saved on this phone. It is sent to Pinwright when the signal is back, even if you close the app; the live fit below works meanwhile.'}
        </Banner>
      ) : null}
      {save.isSuccess && !save.data.kept && sightIn && !formState.isDirty ? (
        <Banner tone="info" title="Saved">
          The server refitted the marks and stored the fit. Open the tape to print it.
        </Banner>
      ) : null}
      {sightIn && !formState.isDirty ? (
        <View style={styles.topActions}>
          <Button label="Open the tape" href={`/sight-ins/${sightIn.id}/tape`} testID="open-tape-top" />
          <Button
            label="Field card: slopes, altitude"
            variant="secondary"
            href={`/sight-ins/${sightIn.id}/field-card`}
            testID="open-field-card"
          />
          <Text variant="small" tone="soft" style={styles.topHint}>
            Drawn from the fit saved with these marks.
          </Text>
        </View>
      ) : null}
      {sightIn && formState.isDirty ? (
        <Text variant="small" tone="soft">
          Unsaved changes: save before opening the tape, which is drawn from the saved fit.
        </Text>
      ) : null}
      {!split ? <FitStrip live={live} checks={checks} /> : null}
      {split ? (
        <View style={styles.split}>
          <View style={styles.column}>
            {header}
            {table}
            {actions}
          </View>
          <View style={styles.column}>{results}</View>
        </View>
      ) : (
        <>
          {header}
          {table}
          {results}
          {actions}
        </>
      )}
      {sightIn && !addOnly ? (
        asking ? (
          <ConfirmBar
            title="Delete this sight-in?"
            message="This deletes the sight-in with its marks, its fit and its saved tapes. It cannot be undone."
            confirmLabel="Delete for good"
            pendingLabel="Deleting…"
            pending={remove.isPending}
            error={remove.isError ? remove.error.message : null}
            onConfirm={() => remove.mutate(sightIn, { onSuccess: () => router.replace(`/bows/${bow.id}`) })}
            onCancel={() => setAsking(false)}
          />
        ) : (
          <Button label="Delete this sight-in" variant="quiet" onPress={() => setAsking(true)} testID="sight-in-delete" />
        )
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  editor: { gap: space.xl },
  section: { gap: space.lg },
  split: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  column: { flex: 1, minWidth: 0, gap: space.xl },
  actionsBlock: { gap: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  topActions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'center' },
  topHint: { flexShrink: 1 },
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  figure: { flexGrow: 1, flexBasis: 110, gap: space.xxs },
  figureValue: { fontSize: 32, lineHeight: 36 },
});
