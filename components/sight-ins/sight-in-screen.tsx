import { MarkAuthors } from '@/components/clients/added-by';
import { SightInEditor } from '@/components/sight-ins/sight-in-editor';
import { SightInLoader } from '@/components/sight-ins/sight-in-loader';
import { ConfirmAtRangeBanner } from '@/components/tuning/confirm-banner';
import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { sightInName } from '@/shared/sight-in-name';

/** A saved sight-in: its marks (editable by the bow's owner; a technician adds marks), the live fit, and the way to its tape. */
export function SightInScreen({ sightInId }: { sightInId: number }) {
  return (
    <SightInLoader
      sightInId={sightInId}
      title="Sight-in"
      failedTitle="The sight-in could not be loaded"
      loadingLabel="Loading the sight-in…"
    >
      {({ me, sightIn, bow, role }) => (
        <Screen>
          <ScreenTitle name={`Sight-in ${sightIn.date}`} />
          <SectionHeading
            level={1}
            title={`Sight-in, ${sightInName(sightIn, { builds: bow.builds, siblings: bow.sightIns })}`}
            description={bow.nickname}
            action={
              <Button label="Import marks (CSV)" variant="secondary" href={`/sight-ins/${sightIn.id}/import`} testID="import-marks" />
            }
          />
          <ConfirmAtRangeBanner sightInId={sightIn.id} subject="sight-in" />
          <MarkAuthors marks={sightIn.marks} meId={me.id} sightInAddedBy={sightIn.addedBy} />
          <SightInEditor key={sightIn.id} bow={bow} sightIn={sightIn} distanceUnit={me.distanceUnit} addOnly={!role.isOwner} />
        </Screen>
      )}
    </SightInLoader>
  );
}
