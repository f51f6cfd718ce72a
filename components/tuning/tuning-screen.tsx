import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { BowLoader } from '@/components/bows/bow-loader';
import { formatDay } from '@/components/bows/readiness-words';
import { RecordRow } from '@/components/bows/record-row';
import { textToNumber } from '@/components/forms/form-numbers';
import { todayIso } from '@/components/level/level-words';
import { useRuns, useSetup, useStartRun } from '@/components/tuning/api';
import { SetupEntryForm } from '@/components/tuning/setup-entry-form';
import { TuningCautions } from '@/components/tuning/tuning-cautions';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { DownloadLink } from '@/components/ui/download-link';
import { ErrorView } from '@/components/ui/error-view';
import { PlusIcon } from '@/components/ui/icons';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { TextField } from '@/components/ui/text-field';
import { Text } from '@/components/ui/text';
import { colors, radii, space } from '@/components/theme';
import type { LengthUnit } from '@/shared/auth';
import type { BowDetail } from '@/shared/bow-detail';
import { paperTuneStartSchema, runOutcomeNames } from '@/shared/paper-tune';
import { setupMeasureKeys, setupMeasures, setupValueWords, type SetupEntry, type SetupMeasureKey } from '@/shared/setup-measures';

const addedByWords = (entry: { addedBy: { name: string }; byTechnician: boolean }) =>
  entry.byTechnician ? ` · added by ${entry.addedBy.name}` : '';

function MeasureRow({
  bow,
  measure,
  unit,
  entries,
  open,
  onOpen,
  onClose,
  canAdd,
}: {
  bow: BowDetail;
  measure: SetupMeasureKey;
  unit: LengthUnit;
  entries: SetupEntry[];
  open: boolean;
  onOpen: () => void;
  onClose: () => void;
  canAdd: boolean;
}) {
  const spec = setupMeasures[measure];
  const [latest, ...older] = entries;
  // Peep height and sight radius are also on the bow's own set-up, which the fit uses: say so when they differ.
  const bowValueMm = measure === 'peep-height' ? bow.peepHeightMm : measure === 'sight-radius' ? bow.sightRadiusMm : null;
  const bowDiffers = bowValueMm !== null && latest && Math.abs((latest.valueMm ?? 0) - bowValueMm) > 0.05;
  return (
    <View style={styles.measure} testID={`measure-${measure}`}>
      <View style={styles.measureHead}>
        <View style={styles.measureWords}>
          <Text variant="label">{spec.name}</Text>
          <Text testID={`measure-${measure}-latest`}>{latest ? setupValueWords(latest, unit) : 'Not recorded'}</Text>
          {latest ? (
            <Text variant="small" tone="soft">
              {formatDay(latest.measuredOn)}
              {addedByWords(latest)}
              {latest.note ? ` · ${latest.note}` : ''}
            </Text>
          ) : null}
          {bowDiffers ? (
            <Text variant="small" tone="due" testID={`measure-${measure}-bow-differs`}>
              The bow’s set-up says {setupValueWords({ measure, valueMm: bowValueMm, choice: null }, unit)}; the fit uses that until the bow
              is edited.
            </Text>
          ) : null}
        </View>
        {canAdd && !open ? (
          <Button label={latest ? 'New entry' : 'Record'} variant="secondary" onPress={onOpen} testID={`measure-${measure}-add`} />
        ) : null}
      </View>
      {open ? <SetupEntryForm bowId={bow.id} measure={measure} unit={unit} onDone={onClose} /> : null}
      {older.length > 0 ? (
        <Text variant="small" tone="soft" testID={`measure-${measure}-history`}>
          Before:{' '}
          {older
            .slice(0, 4)
            .map((entry) => `${setupValueWords(entry, unit)} (${formatDay(entry.measuredOn)}${addedByWords(entry)})`)
            .join('; ')}
          {older.length > 4 ? `; and ${older.length - 4} more` : ''}
        </Text>
      ) : null}
    </View>
  );
}

function SetupSection({ bow, unit, canAdd }: { bow: BowDetail; unit: LengthUnit; canAdd: boolean }) {
  const setup = useSetup(bow.id);
  const [open, setOpen] = useState<SetupMeasureKey | null>(null);
  if (setup.isPending) return <LoadingView label="Loading the set-up…" />;
  if (setup.isError)
    return (
      <ErrorView title="The set-up could not be loaded" error={setup.error} onRetry={() => setup.refetch()} retrying={setup.isFetching} />
    );
  return (
    <View style={styles.section}>
      <SectionHeading
        title="Set-up"
        level={2}
        description="Each entry is kept; the newest shows. A new value that differs from the last is logged as a change: the level check becomes due and tapes must be confirmed at the range."
      />
      {setupMeasureKeys.map((measure) => (
        <MeasureRow
          key={measure}
          bow={bow}
          measure={measure}
          unit={unit}
          entries={setup.data.entries.filter((entry) => entry.measure === measure)}
          open={open === measure}
          onOpen={() => setOpen(measure)}
          onClose={() => setOpen(null)}
          canAdd={canAdd}
        />
      ))}
    </View>
  );
}

function StartRunForm({ bow, distanceUnit }: { bow: BowDetail; distanceUnit: 'yd' | 'm' }) {
  const router = useRouter();
  const start = useStartRun(bow.id);
  // Paper at about 5 yd (4.5 m) is common practice, no published source.
  const [distance, setDistance] = useState(distanceUnit === 'yd' ? '5' : '4.5');
  const [error, setError] = useState<string | null>(null);
  const submit = () => {
    const parsed = paperTuneStartSchema.safeParse({
      distance: textToNumber(distance),
      unit: distanceUnit,
      startedOn: todayIso(),
      buildId: bow.builds[0]?.id ?? null,
    });
    if (!parsed.success) {
      setError(parsed.error.issues[0].message);
      return;
    }
    setError(null);
    start.mutate(parsed.data, {
      onSuccess: (run) => router.push(`/paper-tunes/${run.id}`),
      onError: (e) => setError(Object.values(e.fields)[0] ?? e.message),
    });
  };
  return (
    <View style={styles.startRow}>
      <View style={styles.distance}>
        <TextField
          label={`Distance to the paper (${distanceUnit})`}
          hint="Commonly about 5 yd (common practice)."
          numeric
          unit={distanceUnit}
          value={distance}
          onChangeText={setDistance}
          error={error ?? undefined}
          testID="run-distance"
        />
      </View>
      <Button
        label="Start a paper-tune run"
        icon={PlusIcon}
        pendingLabel="Starting…"
        pending={start.isPending}
        onPress={submit}
        testID="start-run"
      />
    </View>
  );
}

function PaperSection({ bow, distanceUnit, canAdd }: { bow: BowDetail; distanceUnit: 'yd' | 'm'; canAdd: boolean }) {
  const runs = useRuns(bow.id);
  return (
    <View style={styles.section}>
      <SectionHeading
        title="Paper tuning"
        level={2}
        description="Shoot through paper from a few yards, read the tear, change one thing, shoot again."
      />
      {canAdd ? <StartRunForm bow={bow} distanceUnit={distanceUnit} /> : null}
      {runs.isPending ? <LoadingView label="Loading the runs…" /> : null}
      {runs.isError ? (
        <ErrorView title="The runs could not be loaded" error={runs.error} onRetry={() => runs.refetch()} retrying={runs.isFetching} />
      ) : null}
      {runs.data?.length === 0 ? <Text tone="soft">No paper-tune runs yet.</Text> : null}
      {runs.data?.map((run) => (
        <RecordRow
          key={run.id}
          testID={`run-row-${run.id}`}
          title={`${formatDay(run.startedOn)} · ${run.distance} ${run.unit}`}
          detail={`${run.shots.length} ${run.shots.length === 1 ? 'shot' : 'shots'} · ${runOutcomeNames[run.outcome]}${run.byTechnician ? ` · by ${run.addedBy.name}` : ''}`}
          href={`/paper-tunes/${run.id}`}
        />
      ))}
    </View>
  );
}

/**
 * A bow's tuning: the set-up measures with their history, the paper-tune
 * runs, and the way to each build's arrow sets; the cautions on top.
 * Example: `<TuningScreen bowId={3} />`
 */
export function TuningScreen({ bowId }: { bowId: number }) {
  return (
    <BowLoader bowId={bowId} title="Tuning">
      {({ bow, me, role }) => (
        <Screen testID="tuning-screen">
          <ScreenTitle name={`Tuning · ${bow.nickname}`} />
          <SectionHeading
            level={1}
            title="Tuning"
            description={`${bow.nickname} · ${bow.hand === 'right' ? 'right hand' : 'left hand'}`}
            action={<Button label="Bow" variant="quiet" href={`/bows/${bow.id}`} />}
          />
          <TuningCautions />
          {!role.isOwner ? (
            <Banner tone="info" title={`${bow.ownerName || 'The archer'}’s bow`}>
              What you add is kept as your own entry, named as yours; the archer’s entries are not changed.
            </Banner>
          ) : null}
          <SetupSection bow={bow} unit={me.lengthUnit} canAdd={role.canAdd} />
          <PaperSection bow={bow} distanceUnit={me.distanceUnit} canAdd={role.canAdd} />
          <View style={styles.section}>
            <SectionHeading title="Arrow sets" level={2} description="Numbered arrows of a build: weights, spin checks, the odd one out." />
            {bow.builds.length === 0 ? <Text tone="soft">Add an arrow build first.</Text> : null}
            {bow.builds.map((build) => (
              <RecordRow
                key={build.id}
                testID={`arrow-sets-${build.id}`}
                title={build.name}
                detail="Arrow sets"
                href={`/builds/${build.id}/arrows`}
              />
            ))}
          </View>
          <View style={styles.section}>
            <SectionHeading
              title="Take them with you"
              level={2}
              description="Set-up entries, paper-tune shots, arrows and range confirmations, one row each (lengths in mm, weights in gr). The bow’s JSON export carries them too."
            />
            <DownloadLink
              label="Download the tuning records (CSV)"
              href={`/api/bows/${bow.id}/tuning.csv`}
              fileName={`tuning-${bow.id}.csv`}
              testID="tuning-csv"
            />
          </View>
        </Screen>
      )}
    </BowLoader>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.sm },
  measure: {
    gap: space.sm,
    padding: space.md,
    borderRadius: radii.md,
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
  },
  measureHead: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'center', justifyContent: 'space-between' },
  measureWords: { flexGrow: 1, flexShrink: 1, flexBasis: 200, gap: space.xxs },
  startRow: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'flex-end' },
  distance: { flexGrow: 1, flexBasis: 200, maxWidth: 320 },
});
