import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useUnits } from '@/components/account/use-units';
import { useDeleteBow } from '@/components/bows/api';
import { bowSetupItems } from '@/components/bows/bow-setup-items';
import { formatLength } from '@/components/forms/form-numbers';
import { KeyValueList } from '@/components/bows/key-value-list';
import { useBowRole } from '@/components/bows/use-bow-role';
import { TuningSummary } from '@/components/tuning/tuning-summary';
import { fitWords, formatDay } from '@/components/bows/readiness-words';
import { buildLine, buildName } from '@/components/builds/build-words';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmBar } from '@/components/ui/confirm-bar';
import { ReadinessBadge } from '@/components/ui/readiness-badge';
import { SectionHeading } from '@/components/ui/section-heading';
import { space } from '@/components/theme';
import type { LengthUnit } from '@/shared/auth';
import type { BowDetail } from '@/shared/bow-detail';
import type { Build } from '@/shared/build';
import type { SightInListItem } from '@/shared/sight-in';
import type { Tape } from '@/shared/tape';
import { formatQuantity, shownUnit, type UnitsLike } from '@/shared/units';

/** What the detail pane shows. */
export type BowSelection =
  | { kind: 'setup' }
  | { kind: 'build'; id: number }
  | { kind: 'sightIn'; id: number }
  | { kind: 'tape'; id: number };

/** The bow's set-up with, for its owner, Edit and Delete (delete asks first and names what is lost). */
export function SetupPanel({ bow, unit }: { bow: BowDetail; unit: LengthUnit }) {
  const router = useRouter();
  const units = useUnits();
  const remove = useDeleteBow();
  const { isOwner } = useBowRole(bow);
  const [asking, setAsking] = useState(false);
  const counts = [
    `${bow.builds.length} ${bow.builds.length === 1 ? 'build' : 'builds'}`,
    `${bow.sightIns.length} ${bow.sightIns.length === 1 ? 'sight-in' : 'sight-ins'}`,
    `${bow.tapes.length} ${bow.tapes.length === 1 ? 'tape' : 'tapes'}`,
  ].join(', ');
  return (
    <Card style={styles.panel} testID="bow-setup">
      <SectionHeading
        title="Set-up"
        action={isOwner ? <Button label="Edit" variant="secondary" href={`/bows/${bow.id}/edit`} testID="bow-edit" /> : undefined}
      />
      <KeyValueList items={bowSetupItems(bow, unit, units)} />
      <TuningSummary bowId={bow.id} unit={unit} />
      {!isOwner ? null : asking ? (
        <ConfirmBar
          title={`Delete ${bow.nickname}?`}
          message={`This deletes the bow with its ${counts}. It cannot be undone.`}
          confirmLabel="Delete for good"
          pendingLabel="Deleting…"
          pending={remove.isPending}
          error={remove.isError ? remove.error.message : null}
          onConfirm={() => remove.mutate(bow.id, { onSuccess: () => router.replace('/') })}
          onCancel={() => setAsking(false)}
          testID="bow-delete-confirm"
        />
      ) : (
        <Button label="Delete this bow" variant="quiet" onPress={() => setAsking(true)} testID="bow-delete" />
      )}
    </Card>
  );
}

/** One build's components and derived numbers. */
function BuildPanel({ bow, build, unit }: { bow: BowDetail; build: Build; unit: LengthUnit }) {
  const units = useUnits();
  const items = [
    {
      label: 'Total',
      value: formatQuantity(build.derived.totalGr, 'mass', units, shownUnit('mass', units) === 'g' ? 2 : 1),
      numeric: true,
    },
    {
      label: 'FOC',
      value: build.derived.focPct === null ? 'Balance point not measured' : `${build.derived.focPct.toFixed(1)} %`,
      numeric: true,
    },
    { label: 'Shaft', value: [build.shaftLabel, build.spine ? `spine ${build.spine}` : ''].filter(Boolean).join(', ') || '—' },
    { label: 'Cut length', value: formatLength(build.cutLengthMm, unit, 1), numeric: true },
    { label: 'Point', value: formatQuantity(build.pointGr, 'mass', units), numeric: true },
    {
      label: 'Speed',
      value: build.speedFps === null ? 'Not chronographed' : formatQuantity(build.speedFps, 'speed', units),
      numeric: true,
    },
  ];
  if (build.derived.kineticEnergyJ !== null && build.derived.kineticEnergyFtLb !== null) {
    items.push({
      label: 'Kinetic energy',
      value: `${build.derived.kineticEnergyJ.toFixed(1)} J (${build.derived.kineticEnergyFtLb.toFixed(1)} ft·lbf), an estimate`,
      numeric: true,
    });
  }
  return (
    <Card style={styles.panel} testID="build-detail">
      <SectionHeading title={build.name} description="Arrow build" />
      <KeyValueList items={items} />
      <View style={styles.actions}>
        <Button label="Open the build" href={`/builds/${build.id}`} />
        <Button label="Sight in with it" variant="secondary" href={`/bows/${bow.id}/sight-ins/new?build=${build.id}`} />
      </View>
    </Card>
  );
}

/** One sight-in's summary, with links to the sight-in and its tape. */
function SightInPanel({ bow, sightIn }: { bow: BowDetail; sightIn: SightInListItem }) {
  const units = useUnits();
  const words = fitWords(sightIn.summary);
  const items = [
    { label: 'Date', value: formatDay(sightIn.date) },
    { label: 'Build', value: buildName(bow.builds, sightIn.buildId) },
    { label: 'Place', value: sightIn.placeLabel || '—' },
    { label: 'Marks', value: words.detail },
  ];
  if (sightIn.summary.speedFps !== null)
    items.push({ label: 'Fitted speed', value: formatQuantity(sightIn.summary.speedFps, 'speed', units) });
  return (
    <Card style={styles.panel} testID="sight-in-detail">
      <SectionHeading title={`Sight-in, ${formatDay(sightIn.date)}`} description={sightIn.placeLabel || undefined} />
      <ReadinessBadge state={words.state} label={words.label} subject="Fit" />
      <KeyValueList items={items} />
      <View style={styles.actions}>
        <Button label="Open the sight-in" href={`/sight-ins/${sightIn.id}`} />
        <Button label="Tape" variant="secondary" href={`/sight-ins/${sightIn.id}/tape`} />
      </View>
    </Card>
  );
}

/** One saved tape layout. */
function TapePanel({ tape }: { tape: Tape }) {
  const items = [
    { label: 'Range', value: `${tape.fromDistance}–${tape.toDistance} ${tape.unit}, every ${tape.step}`, numeric: true },
    { label: 'Numbers', value: tape.orientation === 'down' ? 'Run down the tape' : 'Run up the tape' },
    { label: 'Width', value: `${tape.widthMm} mm${tape.mirror ? ', mirrored' : ''}` },
    { label: 'Paper', value: tape.paper === 'a4' ? 'A4' : 'Letter' },
  ];
  return (
    <Card style={styles.panel} testID="tape-detail">
      <SectionHeading title={tape.label || 'Tape layout'} description={`Saved ${formatDay(tape.updatedAt)}`} />
      <KeyValueList items={items} />
      <Button label="Open the tape" href={`/sight-ins/${tape.sightInId}/tape?tape=${tape.id}`} />
    </Card>
  );
}

/**
 * The wide screen's detail pane: the selected record of the bow.
 * Example: `<BowDetailPanel bow={bow} unit="mm" selection={{ kind: 'build', id: 4 }} />`
 */
export function BowDetailPanel({ bow, unit, selection }: { bow: BowDetail; unit: LengthUnit; selection: BowSelection }) {
  if (selection.kind === 'build') {
    const build = bow.builds.find((item) => item.id === selection.id);
    if (build) return <BuildPanel bow={bow} build={build} unit={unit} />;
  }
  if (selection.kind === 'sightIn') {
    const sightIn = bow.sightIns.find((item) => item.id === selection.id);
    if (sightIn) return <SightInPanel bow={bow} sightIn={sightIn} />;
  }
  if (selection.kind === 'tape') {
    const tape = bow.tapes.find((item) => item.id === selection.id);
    if (tape) return <TapePanel tape={tape} />;
  }
  return <SetupPanel bow={bow} unit={unit} />;
}

/** A build's one-line summary, for lists. */
export function buildRowDetail(build: Build, units?: UnitsLike): string {
  return buildLine(build.derived, build.speedFps, units);
}

const styles = StyleSheet.create({
  panel: { gap: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
