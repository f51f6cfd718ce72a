import { useRouter } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, useWindowDimensions, View } from 'react-native';

import { useMe } from '@/components/auth/api';
import { useBow } from '@/components/bows/api';
import { useCheck, useDiscardCheck, useLevel, useSaveCheck } from '@/components/level/api';
import { LevelCaution } from '@/components/level/level-caution';
import { formatWhen, levelStateLabels, placeLabels, resultLabels, resumeIndex, workedCount } from '@/components/level/level-words';
import { bigTap } from '@/components/level/result-buttons';
import { resultColors, resultIcons } from '@/components/level/result-icons';
import { stepGuides } from '@/components/level/step-guide';
import { SavedStep, StepPanel } from '@/components/level/step-panel';
import { isApiError } from '@/components/api/client';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmBar } from '@/components/ui/confirm-bar';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { ReadinessBadge } from '@/components/ui/readiness-badge';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { borders, colors, radii, space } from '@/components/theme';
import { levelStepKeys, type LevelCheck, type LevelStepKey } from '@/shared/level';

/** Window width (px) from which every step of a check is shown at once. */
export const allStepsFrom = 900;

type PressState = { pressed: boolean; hovered?: boolean; focused?: boolean };

/** Words that fit under a fifth of a phone's width. */
const stripWords: Record<LevelStepKey, string> = {
  setup: 'Set-up',
  'first-axis': '1st axis',
  'second-axis': '2nd axis',
  'third-axis': '3rd axis',
  range: 'Range',
};

/** The five steps as large numbered tabs with their results; tapping one jumps to it. */
function StepStrip({ check, current, onSelect }: { check: LevelCheck; current: number; onSelect: (index: number) => void }) {
  return (
    <View style={styles.strip} role="tablist" aria-label="Steps of the check">
      {check.steps.map((step, index) => {
        const selected = index === current;
        const Icon = step.result ? resultIcons[step.result] : null;
        const look = step.result ? resultColors[step.result] : null;
        return (
          <Pressable
            key={step.step}
            role="tab"
            aria-selected={selected}
            accessibilityLabel={`Step ${index + 1}, ${stepGuides[step.step].title}${step.result ? `: ${resultLabels[step.result]}` : ''}`}
            onPress={() => onSelect(index)}
            testID={`strip-${step.step}`}
            style={({ hovered, focused }: PressState) => [
              styles.stripItem,
              look && { backgroundColor: look.ground, borderColor: look.text },
              selected && styles.stripSelected,
              hovered && !selected && styles.stripHovered,
              focused && styles.focused,
            ]}
          >
            {Icon && look ? <Icon size={22} color={look.text} /> : <Text variant="label">{index + 1}</Text>}
            <Text variant="caption" numberOfLines={1} style={styles.stripWord}>
              {stripWords[step.step]}
            </Text>
          </Pressable>
        );
      })}
    </View>
  );
}

/** What the bow's level is now, after a completed check. */
function Outcome({ check }: { check: LevelCheck }) {
  const level = useLevel(check.bowId);
  return (
    <Card testID="check-outcome">
      <Text role="heading" aria-level={2} variant="title">
        Check complete
      </Text>
      <Text tone="soft">
        {placeLabels[check.place]} check, completed {check.completedAt ? formatWhen(check.completedAt) : ''} by {check.performedBy.name}.
      </Text>
      {level.data ? (
        <View style={styles.outcomeState}>
          <ReadinessBadge
            state={level.data.state}
            label={levelStateLabels[level.data.state]}
            subject="Level"
            testID="check-outcome-state"
          />
          <Text>{level.data.reason}</Text>
          {level.data.state === 'failed' ? (
            <Text tone="soft">
              Fix what failed (each step&apos;s &ldquo;If it is not&rdquo; says how), then start a new check. If it will not come level,
              take the bow to a pro shop.
            </Text>
          ) : null}
        </View>
      ) : null}
      <View style={styles.row}>
        <Button label="Back to the bow's level" href={`/bows/${check.bowId}/level`} style={styles.big} />
        <Button label="Bench" variant="secondary" href="/" style={styles.big} />
      </View>
    </Card>
  );
}

/** The finish box on a wide screen: completes once every step has a saved result. */
function FinishBox({ check }: { check: LevelCheck }) {
  const save = useSaveCheck(check.id);
  const missing = check.steps.filter((step) => step.result === null);
  return (
    <Card testID="finish-box">
      <Text role="heading" aria-level={2} variant="title">
        Finish the check
      </Text>
      <Text tone="soft">
        {missing.length === 0
          ? 'Every step has a result. Finishing records the check; it cannot be changed afterwards.'
          : `Still without a result: ${missing.map((step) => stepGuides[step.step].title.toLowerCase()).join(', ')}. Save each step first (choose "Skipped" for a step you leave out).`}
      </Text>
      {save.error ? (
        <Banner tone="error" title="Not finished">
          {save.error.message}
        </Banner>
      ) : null}
      <Button
        label="Finish the check"
        pendingLabel="Finishing…"
        pending={save.isPending}
        disabled={missing.length > 0}
        onPress={() => save.mutate({ complete: true })}
        style={styles.big}
        testID="finish-check"
      />
    </Card>
  );
}

function Discard({ check }: { check: LevelCheck }) {
  const router = useRouter();
  const discard = useDiscardCheck();
  const [asking, setAsking] = useState(false);
  if (!asking)
    return <Button label="Discard this check" variant="quiet" onPress={() => setAsking(true)} style={styles.big} testID="discard-check" />;
  return (
    <ConfirmBar
      title="Discard this check?"
      message={`The ${workedCount(check)} saved ${workedCount(check) === 1 ? 'step' : 'steps'} and any photos of it are removed. The bow's level state stays as it was.`}
      confirmLabel="Discard"
      pendingLabel="Discarding…"
      pending={discard.isPending}
      error={discard.error?.message}
      onCancel={() => setAsking(false)}
      onConfirm={() => discard.mutate(check.id, { onSuccess: () => router.replace(`/bows/${check.bowId}/level`) })}
    />
  );
}

/**
 * The guided level check. On a phone one step at a time (it opens at the first
 * step without a result, so leaving and coming back resumes it); from 900 px
 * wide every step at once. A completed check, or someone else's, reads back.
 * Example: `<CheckScreen checkId={12} />`
 */
export function CheckScreen({ checkId }: { checkId: number }) {
  const check = useCheck(checkId);
  const me = useMe();
  const bow = useBow(check.data?.bowId);
  const { width } = useWindowDimensions();
  const wide = width >= allStepsFrom;
  const [index, setIndex] = useState<number | null>(null);

  if (check.isPending) return <LoadingView label="Opening the check…" />;
  if (check.isError) {
    if (isApiError(check.error, 404) || isApiError(check.error, 400)) return <NotFoundScreen />;
    return (
      <ErrorView title="The check could not be loaded" error={check.error} onRetry={() => check.refetch()} retrying={check.isFetching} />
    );
  }

  const data = check.data;
  const editable = data.status === 'open' && me.data?.id === data.performedBy.id;
  const current = Math.min(index ?? resumeIndex(data), levelStepKeys.length - 1);
  const nickname = bow.data?.nickname ?? 'the bow';
  // The caution comes before the work: above every step on a wide screen, above the set-up on a
  // phone; on a phone's later steps it moves below, so the step itself is what the archer sees first.
  const cautionFirst = editable && (wide || current === 0);

  const header = (
    <View style={styles.header}>
      <TextLink href={`/bows/${data.bowId}/level`} label={`← Level of ${nickname}`} />
      <Text role="heading" aria-level={1} variant="heading">
        Level check
      </Text>
      <Text tone="soft">
        {placeLabels[data.place]} · started {formatWhen(data.startedAt)} · {data.performedBy.name}
        {data.status === 'open' ? ` · ${workedCount(data)} of ${levelStepKeys.length} steps done` : ''}
      </Text>
    </View>
  );

  let body;
  if (!editable) {
    body = (
      <>
        {data.status === 'complete' ? (
          <Outcome check={data} />
        ) : (
          <Banner tone="info">This check is in progress by {data.performedBy.name}; it is shown read-only.</Banner>
        )}
        <View style={[styles.readGrid, wide && styles.readGridWide]}>
          {data.steps.map((step) => (
            <Card key={step.step} testID={`read-${step.step}`} style={wide ? styles.readCellWide : undefined}>
              <Text variant="caption" tone="soft">
                Step {levelStepKeys.indexOf(step.step) + 1}
              </Text>
              <Text role="heading" aria-level={2} variant="title">
                {stepGuides[step.step].title}
              </Text>
              <SavedStep check={data} stepKey={step.step} />
            </Card>
          ))}
        </View>
        {data.note ? <Text>Note: {data.note}</Text> : null}
      </>
    );
  } else if (wide) {
    body = (
      <>
        {data.steps.map((step) => (
          <Card key={step.step}>
            <StepPanel check={data} stepKey={step.step} editable submitLabel="Save this step" sideBySide />
          </Card>
        ))}
        <FinishBox check={data} />
        <Discard check={data} />
      </>
    );
  } else {
    const stepKey = levelStepKeys[current];
    const isLast = current === levelStepKeys.length - 1;
    const othersDone = data.steps.every((step) => step.step === stepKey || step.result !== null);
    const completes = isLast && othersDone;
    body = (
      <>
        <StepStrip check={data} current={current} onSelect={setIndex} />
        <StepPanel
          key={stepKey}
          check={data}
          stepKey={stepKey}
          editable
          completes={completes}
          submitLabel={completes ? 'Save and finish' : isLast ? 'Save' : 'Save and continue'}
          onSaved={(saved) => {
            if (saved.status === 'complete') return;
            const next = saved.steps.findIndex((step, i) => i > current && step.result === null);
            const anyMissing = saved.steps.findIndex((step) => step.result === null);
            setIndex(next !== -1 ? next : anyMissing !== -1 ? anyMissing : Math.min(current + 1, levelStepKeys.length - 1));
          }}
          secondary={
            current > 0 ? (
              <Button label="Back" variant="secondary" onPress={() => setIndex(current - 1)} style={styles.big} testID="step-back" />
            ) : null
          }
        />
        <Discard check={data} />
      </>
    );
  }

  return (
    <Screen testID="check-screen">
      <ScreenTitle name="Level check" />
      {header}
      {cautionFirst ? <LevelCaution /> : null}
      {body}
      {editable && !cautionFirst ? <LevelCaution /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: space.xs },
  strip: { flexDirection: 'row', gap: space.xs },
  stripItem: {
    flex: 1,
    minWidth: 0,
    minHeight: bigTap,
    alignItems: 'center',
    justifyContent: 'center',
    gap: space.xxs,
    borderRadius: radii.md,
    borderWidth: borders.control,
    borderColor: colors.lineStrong,
    backgroundColor: colors.surface,
    paddingHorizontal: space.xxs,
  },
  stripSelected: { borderWidth: 3, borderColor: colors.signal },
  stripHovered: { backgroundColor: colors.sunken },
  stripWord: { fontSize: 12, lineHeight: 16 },
  focused: { outlineColor: colors.focus, outlineStyle: 'solid', outlineWidth: borders.focus, outlineOffset: 2 },
  outcomeState: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  big: { minHeight: bigTap },
  readGrid: { gap: space.lg },
  readGridWide: { flexDirection: 'row', flexWrap: 'wrap' },
  readCellWide: { flexBasis: 320, flexGrow: 1 },
});
