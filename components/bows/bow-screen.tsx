import { useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';

import { useMe } from '@/components/auth/api';
import { useBow } from '@/components/bows/api';
import { useUnits } from '@/components/account/use-units';
import { BowDetailPanel, buildRowDetail, SetupPanel, type BowSelection } from '@/components/bows/bow-detail-panel';
import { sightKindNames } from '@/components/bows/bow-setup-items';
import { formatDrawLength } from '@/components/forms/form-numbers';
import { fitWords, formatDay, levelWords, sightInWords, tapeWords } from '@/components/bows/readiness-words';
import { RecordRow } from '@/components/bows/record-row';
import { useBowRole } from '@/components/bows/use-bow-role';
import { BowSharingLink } from '@/components/shares/bow-sharing-link';
import { BuildToolsLinks } from '@/components/compare/build-tools-links';
import { buildName } from '@/components/builds/build-words';
import { addedByNote } from '@/components/clients/added-by';
import { sightInName } from '@/shared/sight-in-name';
import { Button } from '@/components/ui/button';
import { ErrorView } from '@/components/ui/error-view';
import { PlusIcon } from '@/components/ui/icons';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { ReadinessBadge } from '@/components/ui/readiness-badge';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { Text } from '@/components/ui/text';
import { colors, radii, space } from '@/components/theme';
import type { LengthUnit } from '@/shared/auth';
import type { BowDetail } from '@/shared/bow-detail';

/** Window width (px) from which the bow's lists and the selected record sit side by side. */
export const bowSplitFrom = 900;

function Readiness({ bow }: { bow: BowDetail }) {
  const parts = [sightInWords(bow.readiness), tapeWords(bow.readiness), levelWords(bow.readiness)].filter(
    (part): part is NonNullable<typeof part> => part !== null,
  );
  return (
    <View style={styles.readiness} testID="bow-readiness">
      {parts.map((part) => (
        <View key={part.label} style={styles.readinessItem}>
          <ReadinessBadge state={part.state} label={part.label} />
          <Text variant="small" tone="soft">
            {part.detail}
          </Text>
        </View>
      ))}
      <View style={styles.readinessLinks}>
        <Button label="Level checks and changes" variant="secondary" href={`/bows/${bow.id}/level`} testID="open-level" />
        <Button label="Before a trip" variant="quiet" href={`/bows/${bow.id}/readiness`} />
        <Button label="Tuning and arrows" variant="secondary" href={`/bows/${bow.id}/tuning`} testID="open-tuning" />
      </View>
    </View>
  );
}

interface ListsProps {
  bow: BowDetail;
  /** Wide screen: rows select; phone: rows link to their screens. */
  selection: BowSelection | null;
  onSelect: (selection: BowSelection) => void;
}

function Lists({ bow, selection, onSelect }: ListsProps) {
  const split = selection !== null;
  const isSelected = (kind: BowSelection['kind'], id?: number) =>
    selection?.kind === kind && (kind === 'setup' || (selection as { id?: number }).id === id);
  const { isOwner, canAdd } = useBowRole(bow);
  const units = useUnits();
  const canSightIn = bow.builds.length > 0;
  return (
    <View style={styles.lists}>
      {split ? (
        <RecordRow
          title="Set-up"
          detail="Draw, sight and peep"
          selected={isSelected('setup')}
          onSelect={() => onSelect({ kind: 'setup' })}
        />
      ) : null}

      <View style={styles.section}>
        <SectionHeading
          title="Arrow builds"
          level={2}
          action={
            canAdd ? (
              <Button label="Add a build" icon={PlusIcon} variant="secondary" href={`/bows/${bow.id}/builds/new`} testID="add-build" />
            ) : undefined
          }
        />
        {bow.builds.length === 0 ? (
          <Text tone="soft">
            {isOwner
              ? 'No builds yet. A build gives the fit the arrow’s weight and diameter.'
              : `No builds yet. Add the arrow ${bow.ownerName || 'the archer'} shoots: it is shown to them as added by you.`}
          </Text>
        ) : (
          bow.builds.map((build) => (
            <RecordRow
              key={build.id}
              testID={`build-row-${build.id}`}
              title={build.name}
              detail={`${buildRowDetail(build, units)}${addedByNote(build.addedBy, bow)}`}
              href={split ? undefined : `/builds/${build.id}`}
              selected={isSelected('build', build.id)}
              onSelect={() => onSelect({ kind: 'build', id: build.id })}
            />
          ))
        )}
        <BuildToolsLinks bowId={bow.id} buildCount={bow.builds.length} />
      </View>

      <View style={styles.section}>
        <SectionHeading
          title="Sight-ins"
          level={2}
          action={
            canAdd ? (
              <Button
                label="Start a sight-in"
                icon={PlusIcon}
                variant={canSightIn ? 'primary' : 'secondary'}
                disabled={!canSightIn}
                href={`/bows/${bow.id}/sight-ins/new`}
                testID="start-sight-in"
              />
            ) : undefined
          }
        />
        {!canSightIn && isOwner ? <Text tone="soft">Add an arrow build first: the fit needs the arrow.</Text> : null}
        {canSightIn && bow.sightIns.length === 0 ? <Text tone="soft">No sight-ins yet. Two marks are enough to start.</Text> : null}
        {bow.sightIns.map((sightIn) => (
          <RecordRow
            key={sightIn.id}
            testID={`sight-in-row-${sightIn.id}`}
            title={sightInName(sightIn, { builds: bow.builds, siblings: bow.sightIns, withoutBuild: true })}
            detail={`${buildName(bow.builds, sightIn.buildId)} · ${fitWords(sightIn.summary).detail}${addedByNote(sightIn.addedBy, bow)}`}
            href={split ? undefined : `/sight-ins/${sightIn.id}`}
            selected={isSelected('sightIn', sightIn.id)}
            onSelect={() => onSelect({ kind: 'sightIn', id: sightIn.id })}
          />
        ))}
      </View>

      <View style={styles.section}>
        <SectionHeading title="Tapes" level={2} />
        {bow.tapes.length === 0 ? <Text tone="soft">No saved tapes. Open a sight-in to lay out and print one.</Text> : null}
        {bow.tapes.map((tape) => (
          <RecordRow
            key={tape.id}
            testID={`tape-row-${tape.id}`}
            title={tape.label || `Tape ${tape.fromDistance}–${tape.toDistance} ${tape.unit}`}
            detail={`Saved ${formatDay(tape.updatedAt)} · ${tape.widthMm} mm wide`}
            href={split ? undefined : `/sight-ins/${tape.sightInId}/tape?tape=${tape.id}`}
            selected={isSelected('tape', tape.id)}
            onSelect={() => onSelect({ kind: 'tape', id: tape.id })}
          />
        ))}
      </View>
    </View>
  );
}

function subtitle(bow: BowDetail, unit: LengthUnit): string {
  return [
    bow.hand === 'right' ? 'Right hand' : 'Left hand',
    `${bow.drawWeightLb} lb`,
    `${formatDrawLength(bow.drawLengthMm, unit)} draw`, // in inches as the trade states it, mm beside it for a millimetre archer
    sightKindNames[bow.sightKind],
  ].join(' · ');
}

/**
 * A bow: readiness, set-up, builds, sight-ins and tapes with their actions. On
 * a wide screen the lists and the selected record sit side by side; on a phone
 * the set-up comes first and each row opens its own screen.
 * Example: `<BowScreen bowId={3} />`
 */
export function BowScreen({ bowId }: { bowId: number }) {
  const me = useMe();
  const bow = useBow(bowId);
  const { width } = useWindowDimensions();
  const split = width >= bowSplitFrom;
  const [selection, setSelection] = useState<BowSelection>({ kind: 'setup' });

  if (!Number.isInteger(bowId) || bowId <= 0) return <NotFoundScreen />;
  if (bow.isPending || !me.data) {
    return (
      <>
        <ScreenTitle name="Bow" />
        <LoadingView label="Loading the bow…" />
      </>
    );
  }
  if (bow.isError) {
    return (
      <>
        <ScreenTitle name="Bow" />
        <ErrorView title="The bow could not be loaded" error={bow.error} onRetry={() => bow.refetch()} retrying={bow.isFetching} />
      </>
    );
  }

  const data = bow.data;
  const unit = me.data.lengthUnit;
  return (
    <Screen testID="bow-screen">
      <ScreenTitle name={data.nickname} />
      <SectionHeading
        level={1}
        title={data.nickname}
        description={subtitle(data, unit)}
        action={<Button label="Bench" variant="quiet" href="/" />}
      />
      <Readiness bow={data} />
      <BowSharingLink bow={data} />
      {split ? (
        <View style={styles.split}>
          <View style={styles.listColumn}>
            <Lists bow={data} selection={selection} onSelect={setSelection} />
          </View>
          <View style={styles.detailColumn}>
            <BowDetailPanel bow={data} unit={unit} selection={selection} />
          </View>
        </View>
      ) : (
        <>
          <SetupPanel bow={data} unit={unit} />
          <Lists bow={data} selection={null} onSelect={setSelection} />
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  readiness: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    gap: space.md,
    padding: space.lg,
    borderRadius: radii.lg,
    backgroundColor: colors.sunken,
  },
  readinessItem: { flexGrow: 1, flexShrink: 1, flexBasis: 220, gap: space.xs },
  readinessLinks: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center', flexBasis: '100%' },
  split: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  listColumn: { flexBasis: 400, flexGrow: 0, flexShrink: 1, minWidth: 320 },
  detailColumn: { flex: 1, minWidth: 0 },
  lists: { gap: space.xl },
  section: { gap: space.sm },
});
