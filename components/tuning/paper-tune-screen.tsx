import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useUnits } from '@/components/account/use-units';
import { useMe } from '@/components/auth/api';
import { useBow } from '@/components/bows/api';
import { formatDay } from '@/components/bows/readiness-words';
import { formatLength, optionalQuantityTextToStored, textToNumber } from '@/components/forms/form-numbers';
import { useAddShot, useEndRun, useRun, useSetup } from '@/components/tuning/api';
import { TearDiagram } from '@/components/tuning/tear-diagram';
import { TearHistory } from '@/components/tuning/tear-history';
import { TuningCautions } from '@/components/tuning/tuning-cautions';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { TextField } from '@/components/ui/text-field';
import { Text } from '@/components/ui/text';
import { colors, radii, space } from '@/components/theme';
import {
  paperTuneShotInputSchema,
  runOutcomeNames,
  tuneAdjustmentKinds,
  tuneAdjustmentNames,
  type PaperTuneRun,
  type TuneAdjustmentKind,
} from '@/shared/paper-tune';
import { messageInUnits, shownUnit } from '@/shared/units';
import { suggestNext, tearNames, type Tear } from '@/shared/paper-tune-rules';
import type { CamSystem, RestKind } from '@/shared/setup-measures';

type ShotErrors = Partial<Record<'tear' | 'lengthMm' | 'arrows' | 'note' | 'changedBefore' | 'changeNote' | 'form', string>>;

function ShotForm({ run }: { run: PaperTuneRun }) {
  const add = useAddShot(run.id);
  // The tear length is typed in the archer's length unit (in or mm; "12 mm" in an inch field works too), stored in mm.
  const units = useUnits();
  const lengthUnit = shownUnit('length', units);
  const first = run.shots.length === 0;
  const [tear, setTear] = useState<Tear | null>(null);
  const [length, setLength] = useState('');
  const [arrows, setArrows] = useState('1');
  const [note, setNote] = useState('');
  const [changed, setChanged] = useState<TuneAdjustmentKind>('none');
  const [changeNote, setChangeNote] = useState('');
  const [errors, setErrors] = useState<ShotErrors>({});

  const submit = () => {
    const parsed = paperTuneShotInputSchema.safeParse({
      tear,
      // Unreadable text is NaN, which the schema names ("Tear length must be a number").
      lengthMm: tear === 'clean' ? null : optionalQuantityTextToStored(length, 'length', units),
      arrows: textToNumber(arrows) ?? 1,
      note,
      changedBefore: first ? 'none' : changed,
      changeNote: first ? '' : changeNote,
    });
    if (!parsed.success) {
      const next: ShotErrors = {};
      for (const issue of parsed.error.issues) {
        const key = String(issue.path[0] ?? 'form') as keyof ShotErrors;
        if (!next[key]) next[key] = messageInUnits(issue.message, units, ['length']);
      }
      setErrors(next);
      return;
    }
    setErrors({});
    add.mutate(parsed.data, {
      onSuccess: () => {
        setTear(null);
        setLength('');
        setNote('');
        setChanged('none');
        setChangeNote('');
      },
      onError: (error) =>
        setErrors({ ...(error.fields as ShotErrors), form: Object.keys(error.fields).length ? undefined : error.message }),
    });
  };

  return (
    <View style={styles.card} testID="shot-form">
      <Text variant="title">Shot {run.shots.length + 1}</Text>
      {!first ? (
        <>
          <SegmentedControl
            label="What did you change since the last shot?"
            options={tuneAdjustmentKinds.map((value) => ({ value, label: tuneAdjustmentNames[value], testID: `changed-${value}` }))}
            value={changed}
            onChange={setChanged}
            error={errors.changedBefore}
            optionBasis={110}
            testID="changed-before"
          />
          {changed !== 'none' ? (
            <TextField
              label="How much (optional)"
              hint="E.g. rest left 1/32 in"
              value={changeNote}
              onChangeText={setChangeNote}
              error={errors.changeNote}
              testID="change-note"
            />
          ) : null}
        </>
      ) : null}
      <TearDiagram value={tear} onChange={setTear} error={errors.tear} />
      {tear !== 'clean' ? (
        <TextField
          label={`Tear length (${lengthUnit})`}
          hint="Hole to the end of the tail’s tear."
          numeric
          unit={lengthUnit}
          value={length}
          onChangeText={setLength}
          error={errors.lengthMm}
          testID="tear-length"
        />
      ) : null}
      <View style={styles.row}>
        <View style={styles.cell}>
          <TextField label="Arrows shot" numeric value={arrows} onChangeText={setArrows} error={errors.arrows} testID="shot-arrows" />
        </View>
        <View style={styles.cellWide}>
          <TextField label="Note (optional)" value={note} onChangeText={setNote} error={errors.note} testID="shot-note" />
        </View>
      </View>
      {errors.form ? (
        <Banner tone="error" title="Not saved">
          {errors.form}
        </Banner>
      ) : null}
      <Button label="Save the shot" pendingLabel="Saving…" pending={add.isPending} onPress={submit} testID="save-shot" />
    </View>
  );
}

function EndButtons({ run }: { run: PaperTuneRun }) {
  const end = useEndRun(run.id);
  const last = run.shots[run.shots.length - 1];
  return (
    <View style={styles.row}>
      <Button
        label="End the run: clean"
        disabled={last?.tear !== 'clean'}
        pending={end.isPending && end.variables?.outcome === 'clean'}
        onPress={() => end.mutate({ outcome: 'clean', note: '' })}
        testID="end-clean"
      />
      <Button
        label="Leave it for the pro shop"
        variant="secondary"
        disabled={run.shots.length === 0}
        pending={end.isPending && end.variables?.outcome === 'pro-shop'}
        onPress={() => end.mutate({ outcome: 'pro-shop', note: '' })}
        testID="end-pro-shop"
      />
      {end.isError ? <Text tone="failed">{end.error.message}</Text> : null}
    </View>
  );
}

/**
 * One paper-tune run: the tears drawn in order, the advice for the last one
 * (worded for the bow's hand, rest kind and cam system), the next shot, and
 * how it ends.
 * Example: `<PaperTuneScreen runId={5} />`
 */
export function PaperTuneScreen({ runId }: { runId: number }) {
  const me = useMe();
  const units = useUnits();
  const lengthUnit = units?.lengthUnit ?? 'mm';
  const run = useRun(runId);
  const bow = useBow(run.data?.bowId);
  const setup = useSetup(run.data?.bowId);
  if (!Number.isInteger(runId) || runId <= 0) return <NotFoundScreen />;
  if (run.isError) {
    return (
      <>
        <ScreenTitle name="Paper tune" />
        <ErrorView title="The run could not be loaded" error={run.error} onRetry={() => run.refetch()} retrying={run.isFetching} />
      </>
    );
  }
  if (run.isPending || bow.isPending || setup.isPending || !me.data) {
    return (
      <>
        <ScreenTitle name="Paper tune" />
        <LoadingView label="Loading the run…" />
      </>
    );
  }
  if (bow.isError)
    return <ErrorView title="The bow could not be loaded" error={bow.error} onRetry={() => bow.refetch()} retrying={bow.isFetching} />;
  const data = run.data;
  const rest = (setup.data?.latest['rest-kind']?.choice ?? null) as RestKind | null;
  const cam = (setup.data?.latest['cam-system']?.choice ?? null) as CamSystem | null;
  const last = data.shots[data.shots.length - 1];
  const advice = last ? suggestNext({ tear: last.tear, lengthMm: last.lengthMm, hand: bow.data.hand, rest, cam }) : null;
  const mine = data.addedBy.id === me.data.id;
  return (
    <Screen testID="paper-tune-screen">
      <ScreenTitle name={`Paper tune · ${bow.data.nickname}`} />
      <SectionHeading
        level={1}
        title="Paper tune"
        description={`${bow.data.nickname} · ${formatDay(data.startedOn)} · paper at ${data.distance} ${data.unit} · ${runOutcomeNames[data.outcome]}${data.byTechnician ? ` · by ${data.addedBy.name}` : ''}`}
        action={<Button label="Tuning" variant="quiet" href={`/bows/${data.bowId}/tuning`} />}
      />
      <TuningCautions />
      <TearHistory shots={data.shots} />
      {advice ? (
        <View style={[styles.card, styles.advice]} testID="advice">
          <Text variant="label">
            After shot {last.position + 1}: {advice.headline}
          </Text>
          {advice.lines.map((line) => (
            <Text key={line.ruleId} variant="small">
              • {line.words}
            </Text>
          ))}
          <Text variant="caption" tone="soft">
            Trade practice, no published source; for a release-aid compound bow, {bow.data.hand === 'right' ? 'right' : 'left'}-handed. When
            unsure, a pro shop.
          </Text>
        </View>
      ) : null}
      {data.shots.length > 0 ? (
        <View style={styles.list}>
          {data.shots.map((shot) => (
            <Text key={shot.id} variant="small" testID={`shot-${shot.position + 1}`}>
              {`Shot ${shot.position + 1}: ${tearNames[shot.tear]}${shot.lengthMm ? `, ${formatLength(shot.lengthMm, lengthUnit)}` : ''} · ${shot.arrows} ${shot.arrows === 1 ? 'arrow' : 'arrows'}`}
              {shot.changedBefore !== 'none'
                ? ` · changed before: ${tuneAdjustmentNames[shot.changedBefore].toLowerCase()}${shot.changeNote ? ` (${shot.changeNote})` : ''}`
                : ''}
              {shot.note ? ` · ${shot.note}` : ''}
              {shot.addedBy.id !== data.addedBy.id ? ` · by ${shot.addedBy.name}` : ''}
            </Text>
          ))}
        </View>
      ) : null}
      {data.outcome === 'open' && mine ? (
        <>
          <ShotForm run={data} />
          <EndButtons run={data} />
        </>
      ) : null}
      {data.outcome === 'open' && !mine ? <Text tone="soft">This run is {data.addedBy.name}’s; only they add shots to it.</Text> : null}
      {data.outcome !== 'open' ? (
        <Banner tone={data.outcome === 'clean' ? 'info' : 'warn'} title={runOutcomeNames[data.outcome]} testID="run-outcome">
          {data.outcome === 'clean'
            ? 'The run ended on a clean hole. If you changed the rest, nock, string or cams, confirm the tape at the range.'
            : 'Left for the pro shop. Take this page along.'}
        </Banner>
      ) : null}
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
  advice: { backgroundColor: colors.infoTint, borderColor: colors.info, gap: space.xs },
  list: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'center' },
  cell: { flexBasis: 120, flexGrow: 0 },
  cellWide: { flexBasis: 200, flexGrow: 1 },
});
