import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';

import { isApiError } from '@/components/api/client';
import { useMe } from '@/components/auth/api';
import { useBow } from '@/components/bows/api';
import { useChanges, useChecks, useDeleteChange, useLevel, useStartCheck } from '@/components/level/api';
import { ChangeForm } from '@/components/level/change-form';
import { allStepsFrom } from '@/components/level/check-screen';
import { LevelCaution } from '@/components/level/level-caution';
import { formatWhen, levelStateLabels, placeLabels, resultSummary, workedCount } from '@/components/level/level-words';
import { bigTap } from '@/components/level/result-buttons';
import { resultColors, resultIcons } from '@/components/level/result-icons';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmBar } from '@/components/ui/confirm-bar';
import { ErrorView } from '@/components/ui/error-view';
import { PlusIcon } from '@/components/ui/icons';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { ReadinessBadge } from '@/components/ui/readiness-badge';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { colors, space } from '@/components/theme';
import { bowChangeLabels, levelStepKeys, type BowChange, type LevelCheck, type LevelPlace, type LevelSummary } from '@/shared/level';

const placeOptions = [
  { value: 'bench' as const, label: 'At the bench' },
  { value: 'range' as const, label: 'At the range' },
];

function StateCard({ level }: { level: LevelSummary }) {
  return (
    <Card testID="level-state">
      <ReadinessBadge state={level.state} label={levelStateLabels[level.state]} subject="Level" testID={`level-state-${level.state}`} />
      <Text variant="lead" testID="level-reason">
        {level.reason}
      </Text>
      {level.lastCheck ? (
        <Text tone="soft">
          Last check: {placeLabels[level.lastCheck.place].toLowerCase()}, {formatWhen(level.lastCheck.startedAt)}, by{' '}
          {level.lastCheck.performedBy.name}.
        </Text>
      ) : null}
      <Text variant="small" tone="soft">
        A check is due after any logged change or every {level.maxAgeDays} days.
      </Text>
    </Card>
  );
}

function StartOrResume({ bowId, level, myOpenCheck }: { bowId: number; level: LevelSummary; myOpenCheck: LevelCheck | null }) {
  const router = useRouter();
  const start = useStartCheck(bowId);
  const [place, setPlace] = useState<LevelPlace>('bench');
  if (myOpenCheck) {
    return (
      <Card testID="resume-card">
        <Text variant="title" role="heading" aria-level={2}>
          A check is in progress
        </Text>
        <Text tone="soft">
          Started {formatWhen(myOpenCheck.startedAt)} · {workedCount(myOpenCheck)} of {levelStepKeys.length} steps done.
        </Text>
        <Button label="Resume the check" href={`/checks/${myOpenCheck.id}`} style={styles.big} fullWidth testID="resume-check" />
      </Card>
    );
  }
  return (
    <Card testID="start-card">
      <Text variant="title" role="heading" aria-level={2}>
        {level.state === 'none' ? 'Check the level' : 'Check again'}
      </Text>
      <Text tone="soft">Five steps: the set-up, the three axes, then a confirmation at the range. You can leave and resume.</Text>
      <SegmentedControl size="large" label="Where" options={placeOptions} value={place} onChange={setPlace} />
      {start.error ? (
        <Banner tone="error" title="Could not start">
          {start.error.message}
        </Banner>
      ) : null}
      <Button
        label="Start a check"
        pendingLabel="Starting…"
        pending={start.isPending}
        onPress={() => start.mutate(place, { onSuccess: (check) => router.push(`/checks/${check.id}`) })}
        style={styles.big}
        fullWidth
        testID="start-check"
      />
    </Card>
  );
}

function CheckRow({ check }: { check: LevelCheck }) {
  return (
    <Card
      href={`/checks/${check.id}`}
      accessibilityLabel={`Open the check of ${formatWhen(check.startedAt)}`}
      testID={`check-row-${check.id}`}
    >
      <View style={styles.rowHead}>
        <Text variant="label">
          {formatWhen(check.startedAt)} · {placeLabels[check.place]}
        </Text>
        <Text variant="small" tone={check.status === 'open' ? 'due' : 'soft'}>
          {check.status === 'open' ? 'In progress' : 'Completed'}
        </Text>
      </View>
      <View style={styles.results}>
        {check.steps.map((step) => {
          if (!step.result) return <View key={step.step} style={styles.emptyDot} />;
          const Icon = resultIcons[step.result];
          return <Icon key={step.step} size={22} color={resultColors[step.result].text} />;
        })}
        <Text variant="small" tone="soft">
          {resultSummary(check)}
        </Text>
      </View>
    </Card>
  );
}

function ChangeRow({ change, mine, since }: { change: BowChange; mine: boolean; since: boolean }) {
  const remove = useDeleteChange();
  const [asking, setAsking] = useState(false);
  return (
    <Card testID={`change-row-${change.id}`} tone={since ? 'raised' : 'flat'}>
      <View style={styles.rowHead}>
        <Text variant="label">{bowChangeLabels[change.kind]}</Text>
        <Text variant="small" tone={since ? 'due' : 'soft'}>
          {formatWhen(change.changedAt)}
          {since ? ' · after the last check' : ''}
        </Text>
      </View>
      {change.note ? <Text>{change.note}</Text> : null}
      <Text variant="caption" tone="soft">
        Logged by {change.loggedBy.name}
      </Text>
      {mine && !asking ? <Button label="Delete" variant="quiet" onPress={() => setAsking(true)} style={styles.big} /> : null}
      {asking ? (
        <ConfirmBar
          title="Delete this change?"
          message="It leaves the change log, and the level state is worked out again without it."
          confirmLabel="Delete"
          pendingLabel="Deleting…"
          pending={remove.isPending}
          error={remove.error?.message}
          onCancel={() => setAsking(false)}
          onConfirm={() => remove.mutate(change.id)}
        />
      ) : null}
    </Card>
  );
}

function Changes({ bowId, level }: { bowId: number; level: LevelSummary }) {
  const changes = useChanges(bowId);
  const me = useMe();
  const [open, setOpen] = useState(false);
  const [logged, setLogged] = useState<string | null>(null);
  const since = new Set(level.changesSince.map((c) => c.id));
  return (
    <View style={styles.section}>
      <SectionHeading
        title="Changes on the bow"
        description="A new string or cables, a moved sight, rest, peep or arrows: log it, and the level is due again."
        action={
          !open ? (
            <Button
              label="Log a change"
              icon={PlusIcon}
              variant="secondary"
              onPress={() => {
                setOpen(true);
                setLogged(null);
              }}
              style={styles.big}
              testID="log-change"
            />
          ) : null
        }
      />
      {logged ? (
        <Banner tone="info" title="Change logged">
          {logged}
        </Banner>
      ) : null}
      {open ? (
        <Card>
          <LevelCaution />
          <ChangeForm
            bowId={bowId}
            onCancel={() => setOpen(false)}
            onLogged={(next) => {
              setOpen(false);
              setLogged(`Level now: ${levelStateLabels[next.state].toLowerCase()}. ${next.reason}`);
            }}
          />
        </Card>
      ) : null}
      {changes.isPending ? <LoadingView label="Loading the change log…" /> : null}
      {changes.isError ? (
        <Banner tone="error" title="The change log could not be loaded">
          {changes.error.message}
        </Banner>
      ) : null}
      {changes.data?.length === 0 ? <Text tone="soft">Nothing logged yet.</Text> : null}
      {changes.data?.map((change) => (
        <ChangeRow key={change.id} change={change} mine={change.loggedBy.id === me.data?.id} since={since.has(change.id)} />
      ))}
    </View>
  );
}

/**
 * A bow's level: the state and why, start or resume a check, the history of
 * checks and the change log. From 900 px wide, the change log sits beside.
 * Example: `<LevelScreen bowId={3} />`
 */
export function LevelScreen({ bowId }: { bowId: number }) {
  const level = useLevel(bowId);
  const checks = useChecks(bowId);
  const bow = useBow(bowId);
  const me = useMe();
  const { width } = useWindowDimensions();
  const wide = width >= allStepsFrom;

  if (level.isPending) return <LoadingView label="Loading the level…" />;
  if (level.isError) {
    if (isApiError(level.error, 404) || isApiError(level.error, 400)) return <NotFoundScreen />;
    return (
      <ErrorView title="The level could not be loaded" error={level.error} onRetry={() => level.refetch()} retrying={level.isFetching} />
    );
  }
  const nickname = bow.data?.nickname ?? 'Bow';
  const myOpenCheck = checks.data?.find((check) => check.status === 'open' && check.performedBy.id === me.data?.id) ?? null;

  const main = (
    <View style={styles.column}>
      <StateCard level={level.data} />
      <StartOrResume bowId={bowId} level={level.data} myOpenCheck={myOpenCheck} />
      <View style={styles.section}>
        <SectionHeading title="Checks" />
        {checks.isPending ? <LoadingView label="Loading the checks…" /> : null}
        {checks.data?.length === 0 ? <Text tone="soft">No checks yet.</Text> : null}
        {checks.data?.map((check) => (
          <CheckRow key={check.id} check={check} />
        ))}
      </View>
    </View>
  );

  return (
    <Screen testID="level-screen">
      <ScreenTitle name={`Level · ${nickname}`} />
      <View style={styles.header}>
        <TextLink href={`/bows/${bowId}`} label={`← ${nickname}`} />
        <SectionHeading
          level={1}
          title="Level"
          description={`${nickname}: sight level on all three axes`}
          action={
            <Button
              label="Before a trip"
              variant="secondary"
              href={`/bows/${bowId}/readiness`}
              style={styles.big}
              testID="open-readiness"
            />
          }
        />
      </View>
      {wide ? (
        <View style={styles.split}>
          {main}
          <View style={styles.column}>
            <Changes bowId={bowId} level={level.data} />
          </View>
        </View>
      ) : (
        <>
          {main}
          <Changes bowId={bowId} level={level.data} />
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: space.xs },
  split: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  column: { flex: 1, minWidth: 0, gap: space.xl },
  section: { gap: space.md },
  rowHead: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: space.sm },
  results: { flexDirection: 'row', alignItems: 'center', gap: space.xs, flexWrap: 'wrap' },
  emptyDot: { width: 18, height: 18, borderRadius: 9, borderWidth: 2, borderColor: colors.lineStrong, borderStyle: 'dashed', margin: 2 },
  big: { minHeight: bigTap },
});
