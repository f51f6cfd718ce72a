import { StyleSheet, View } from 'react-native';

import { isApiError } from '@/components/api/client';
import { formatDay } from '@/components/bows/readiness-words';
import { useReadiness } from '@/components/level/api';
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
import type { TripReadiness } from '@/shared/level';

const sheetId = 'trip-sheet';

function Marks({ marks }: { marks: NonNullable<TripReadiness['marks']> }) {
  return (
    <View style={styles.table} role="table" aria-label="Confirmed marks">
      <View style={[styles.tr, styles.th]} role="row">
        <Text variant="label" style={styles.td} role="columnheader">
          Distance
        </Text>
        <Text variant="label" style={styles.td} role="columnheader">
          Scale
        </Text>
      </View>
      {marks.marks.map((mark, index) => (
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

/**
 * Before a trip: one bow's level state, its latest confirmed marks and the
 * longest of them, the saved tape and where it came from, and what to look at.
 * Fits on one printed page (web: a print button and a print stylesheet).
 * Example: `<ReadinessScreen bowId={3} />`
 */
export function ReadinessScreen({ bowId }: { bowId: number }) {
  const readiness = useReadiness(bowId);
  if (readiness.isPending) return <LoadingView label="Gathering the bow's records…" />;
  if (readiness.isError) {
    if (isApiError(readiness.error, 404) || isApiError(readiness.error, 400)) return <NotFoundScreen />;
    return <ErrorView title="The summary could not be loaded" error={readiness.error} onRetry={() => readiness.refetch()} retrying={readiness.isFetching} />;
  }
  const data = readiness.data;
  const { level, marks, tape } = data;

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

        <View style={styles.grid}>
          <View style={styles.cell} {...cardInPrint}>
          <Card testID="readiness-level">
            <Text variant="label">Level</Text>
            <ReadinessBadge state={level.state} label={levelStateLabels[level.state]} subject="Level" />
            <Text>{level.reason}</Text>
            {level.lastCheck ? (
              <Text variant="small" tone="soft">
                Last check {formatWhen(level.lastCheck.startedAt)} ({level.lastCheck.place}){level.rangeConfirmed ? ', confirmed at the range' : ''}.
              </Text>
            ) : null}
          </Card>
          </View>

          <View style={styles.cell} {...cardInPrint}>
          <Card testID="readiness-tape">
            <Text variant="label">Tape</Text>
            {tape ? (
              <>
                <Text>
                  {tape.label ? `“${tape.label}”, ` : ''}
                  {tape.fromDistance}–{tape.toDistance} {tape.unit}, printed from the sight-in of {formatDay(tape.sessionDate)}
                  {tape.fromLatestSession ? ' (the latest).' : '.'}
                </Text>
                <Text variant="small" tone="soft">
                  Saved {formatWhen(tape.savedAt)}.
                </Text>
              </>
            ) : (
              <Text tone="soft">No tape saved.</Text>
            )}
          </Card>
          </View>
        </View>

        <View {...cardInPrint}>
        <Card testID="readiness-marks">
          <Text variant="label">Confirmed marks</Text>
          {marks ? (
            <>
              <Text tone="soft">
                Sight-in of {formatDay(marks.date)}
                {marks.placeLabel ? ` at ${marks.placeLabel}` : ''}
                {marks.buildName ? `, arrows: ${marks.buildName}` : ''}.
              </Text>
              {marks.longestDistance !== null ? (
                <Text variant="lead" testID="readiness-longest">
                  Longest confirmed: <Text variant="numeralLarge">{marks.longestDistance}</Text> {marks.longestUnit}
                </Text>
              ) : null}
              <Marks marks={marks} />
            </>
          ) : (
            <Text tone="soft">No sight-in yet.</Text>
          )}
        </Card>
          </View>

        {data.warnings.length > 0 ? (
          <Banner tone="warn" title="Look at before you go" testID="readiness-warnings">
            <View style={styles.list}>
              {data.warnings.map((warning) => (
                <Text key={warning}>• {warning}</Text>
              ))}
            </View>
          </Banner>
        ) : (
          <Banner tone="info" title="Nothing open">
            No open warnings for this bow.
          </Banner>
        )}

        <Banner tone="caution">
          A printed tape is an estimate until every distance you will shoot has been confirmed at the range. Slope and altitude
          corrections are estimates too: confirm on real terrain.
        </Banner>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  tools: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'center', gap: space.md },
  sheet: { gap: space.lg },
  header: { gap: space.xs },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  cell: { flexGrow: 1, flexBasis: 280 },
  table: { borderTopWidth: borders.hairline, borderColor: colors.line },
  tr: { flexDirection: 'row', borderBottomWidth: borders.hairline, borderColor: colors.line, paddingVertical: space.xs },
  th: { backgroundColor: colors.sunken },
  stripe: { backgroundColor: colors.paper },
  td: { flex: 1, paddingHorizontal: space.sm },
  list: { gap: space.xs },
});
