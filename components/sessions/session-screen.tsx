import { MarkAuthors } from '@/components/clients/added-by';
import { SessionEditor } from '@/components/sessions/session-editor';
import { SessionLoader } from '@/components/sessions/session-loader';
import { ConfirmAtRangeBanner } from '@/components/tuning/confirm-banner';
import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { sightInName } from '@/shared/sight-in-name';

/** A saved sight-in: its marks (editable by the bow's owner; a technician adds marks), the live fit, and the way to its tape. */
export function SessionScreen({ sessionId }: { sessionId: number }) {
  return (
    <SessionLoader sessionId={sessionId} title="Sight-in" failedTitle="The sight-in could not be loaded" loadingLabel="Loading the sight-in…">
      {({ me, session, bow, role }) => (
        <Screen>
          <ScreenTitle name={`Sight-in ${session.date}`} />
          <SectionHeading
            level={1}
            title={`Sight-in, ${sightInName(session, { builds: bow.builds, siblings: bow.sessions })}`}
            description={bow.nickname}
            action={<Button label="Import marks (CSV)" variant="secondary" href={`/sessions/${session.id}/import`} testID="import-marks" />}
          />
          <ConfirmAtRangeBanner sessionId={session.id} subject="sight-in" />
          <MarkAuthors marks={session.marks} meId={me.id} sessionAddedBy={session.addedBy} />
          <SessionEditor key={session.id} bow={bow} session={session} distanceUnit={me.distanceUnit} addOnly={!role.isOwner} />
        </Screen>
      )}
    </SessionLoader>
  );
}
