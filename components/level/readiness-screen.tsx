import { StyleSheet, View } from 'react-native';

import { isApiError } from '@/components/api/client';
import { useTripByBuild } from '@/components/level/trip-api';
import { formatWhen, levelStateLabels } from '@/components/level/level-words';
import { PrintButton, PrintOnly } from '@/components/level/print-support';
import { cardInPrint, hideInPrint } from '@/components/level/print-marks';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { ReadinessBadge } from '@/components/ui/readiness-badge';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { borders, colors, space } from '@/components/theme';
import type { TripBuild } from '@/shared/trip';

const sheetId = 'trip-sheet';

function Marks({ marks, label }: { marks: NonNullable<TripBuild['marks']>['marks']; label: string }) {
  return (
    <View style={styles.table} role="table" aria-label={label}>
      <View style={[styles.tr, styles.th]} role="row">
        <Text variant="label" style={styles.td} role="columnheader">
          Distance
        </Text>
        <Text variant="label" style={styles.td} role="columnheader">
          Scale
        </Text>
      </View>
      {marks.map((mark, index) => (
        <View key={index} style={[styles.tr, index % 2 === 1 && styles.stripe]} role="row">
          <Text variant="numeral" style={styles.td} role="cell">
            {mark.distance} {mark.unit}
          </Text>
          <Text variant="numeral" style={styles.td} role="cell">
            {mark.scaleMm.toFixed(1)} mm
          </Text>
        </View>
      ))}
    </View>
  );
}

/** One build's card: its latest sight-in's marks, its own tape, and what to look at for it. */
function BuildPart({ part }: { part: TripBuild }) {
  const { build, marks, tape, warnings } = part;
  return (
    <View {...cardInPrint}>
      <Card testID={`readiness-build-${build.id}`}>
        <SectionHeading level={2} title={`Arrows: ${build.name}`} />
        <View style={styles.part}>
          <Text variant="label">Tape</Text>
          {tape ? (
            <>
              <Text testID={`readiness-build-${build.id}-tape`}>
                {tape.label ? `“${tape.label}”, ` : ''}
                {tape.fromDistance}–{tape.toDistance} {tape.unit}, printed from the sight-in of {tape.sightInName}
                {tape.fromLatestSightIn ? ' (this build’s latest).' : '.'}
              </Text>
              <Text variant="small" tone="soft">
                Saved {formatWhen(tape.savedAt)}.
              </Text>
            </>
          ) : (
            <Text tone="soft">No tape saved for this build.</Text>
          )}
        </View>
        <View style={styles.part}>
          <Text variant="label">Confirmed marks</Text>
          {marks ? (
            <>
              <Text tone="soft">Latest sight-in of this build: {marks.name}.</Text>
              {marks.longestDistance !== null ? (
                <Text variant="lead" testID={`readiness-build-${build.id}-longest`}>
                  Longest confirmed: <Text variant="numeralLarge">{marks.longestDistance}</Text> {marks.longestUnit}
                </Text>
              ) : null}
              <Marks marks={marks.marks} label={`Confirmed marks of ${build.name}`} />
            </>
          ) : (
            <Text tone="soft">Not sighted in with this build yet.</Text>
          )}
        </View>
        {warnings.length > 0 ? (
          <Banner tone="warn" title={`Look at before you go: ${build.name}`} testID={`readiness-build-${build.id}-warnings`}>
            <View style={styles.list}>
              {warnings.map((warning) => (
                <Text key={warning}>• {warning}</Text>
              ))}
            </View>
          </Banner>
        ) : (
          <Text tone="soft">Nothing open for this build.</Text>
        )}
      </Card>
    </View>
  );
}

/**
 * Before a trip: one bow's level state, then each arrow build on its own: its
 * latest confirmed marks and the longest of them, its saved tape and the
 * sight-in it came from (never another build's), and what to look at.
 * Fits on printed pages (web: a print button and a print stylesheet).
 * Example: `<ReadinessScreen bowId={3} />`
 */
export function ReadinessScreen({ bowId }: { bowId: number }) {
  const readiness = useTripByBuild(bowId);
  if (readiness.isPending) return <LoadingView label="Gathering the bow's records…" />;
  if (readiness.isError) {
    if (isApiError(readiness.error, 404) || isApiError(readiness.error, 400)) return <NotFoundScreen />;
    return (
      <ErrorView
        title="The summary could not be loaded"
        error={readiness.error}
        onRetry={() => readiness.refetch()}
        retrying={readiness.isFetching}
      />
    );
  }
  const data = readiness.data;
  const { level } = data;
  const sighted = data.builds.filter((part) => part.marks !== null);
  const unsighted = data.builds.filter((part) => part.marks === null);

  return (
    <Screen testID="readiness-screen">
      <ScreenTitle name={`Before a trip · ${data.bow.nickname}`} />
      <PrintOnly rootId={sheetId} />
      <View {...hideInPrint} style={styles.tools}>
        <TextLink href={`/bows/${bowId}/level`} label="← Level" />
        <PrintButton testID="print-readiness" />
      </View>
      <View nativeID={sheetId} style={styles.sheet}>
        <View style={styles.header}>
          <SectionHeading level={1} title={`Before a trip: ${data.bow.nickname}`} description={data.bow.sightDescription || undefined} />
          <Text variant="caption" tone="soft">
            As of {formatWhen(data.generatedAt)}
          </Text>
        </View>

        <View {...cardInPrint}>
          <Card testID="readiness-level">
            <Text variant="label">Level</Text>
            <ReadinessBadge state={level.state} label={levelStateLabels[level.state]} subject="Level" />
            <Text>{level.reason}</Text>
            {level.lastCheck ? (
              <Text variant="small" tone="soft">
                Last check {formatWhen(level.lastCheck.startedAt)} ({level.lastCheck.place})
                {level.rangeConfirmed ? ', confirmed at the range' : ''}.
              </Text>
            ) : null}
          </Card>
        </View>

        {data.bowWarnings.length > 0 ? (
          <Banner tone="warn" title="Look at before you go" testID="readiness-warnings">
            <View style={styles.list}>
              {data.bowWarnings.map((warning) => (
                <Text key={warning}>• {warning}</Text>
              ))}
            </View>
          </Banner>
        ) : null}

        {sighted.length > 1 ? (
          <Text tone="soft">
            {sighted.length} arrow builds are sighted in on this bow. Each tape below is checked against its own build’s sight-ins only:
            take the tape of the arrows you will shoot.
          </Text>
        ) : null}
        {sighted.map((part) => (
          <BuildPart key={part.build.id} part={part} />
        ))}
        {unsighted.length > 0 ? (
          <Text tone="soft" testID="readiness-unsighted">
            Not sighted in yet: {unsighted.map((part) => part.build.name).join(', ')}.
          </Text>
        ) : null}

        {data.bowWarnings.length === 0 && sighted.every((part) => part.warnings.length === 0) ? (
          <Banner tone="info" title="Nothing open">
            No open warnings for this bow.
          </Banner>
        ) : null}

        <Banner tone="caution">
          A printed tape is an estimate until every distance you will shoot has been confirmed at the range. Slope and altitude corrections
          are estimates too: confirm on real terrain.
        </Banner>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  tools: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'center', gap: space.md },
  sheet: { gap: space.lg },
  header: { gap: space.xs },
  table: { borderTopWidth: borders.hairline, borderColor: colors.line },
  tr: { flexDirection: 'row', borderBottomWidth: borders.hairline, borderColor: colors.line, paddingVertical: space.xs },
  th: { backgroundColor: colors.sunken },
  stripe: { backgroundColor: colors.paper },
  td: { flex: 1, paddingHorizontal: space.sm },
  list: { gap: space.xs },
  part: { gap: space.xs },
});
