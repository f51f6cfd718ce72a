import { SightInLoader } from '@/components/sight-ins/sight-in-loader';
import { TapeEditor } from '@/components/tapes/tape-editor';
import { ConfirmAtRangeBanner } from '@/components/tuning/confirm-banner';
import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { sightInName } from '@/shared/sight-in-name';

/** The tape of a sight-in: options, preview, print and downloads (a saved layout when `tapeId` is given). */
export function TapeScreen({ sightInId, tapeId }: { sightInId: number; tapeId?: number }) {
  return (
    <SightInLoader sightInId={sightInId} title="Tape" failedTitle="The tape could not be loaded" loadingLabel="Loading the fit…">
      {({ me, sightIn, bow, role }) => {
        const tape = tapeId ? bow.tapes.find((item) => item.id === tapeId && item.sightInId === sightInId) : undefined;
        return (
          <Screen>
            <ScreenTitle name="Tape" />
            <SectionHeading
              level={1}
              title={tape?.label ? `Tape: ${tape.label}` : 'Sight tape'}
              description={`${bow.nickname} · sight-in of ${sightInName(sightIn, { builds: bow.builds, siblings: bow.sightIns })}`}
              action={<Button label="Back to the sight-in" variant="quiet" href={`/sight-ins/${sightInId}`} />}
            />
            <ConfirmAtRangeBanner sightInId={sightIn.id} subject="tape" />
            <TapeEditor
              key={tape?.id ?? 'new'}
              bow={bow}
              sightIn={sightIn}
              tape={tape}
              lengthUnit={me.lengthUnit}
              distanceUnit={me.distanceUnit}
              addOnly={!role.isOwner}
            />
          </Screen>
        );
      }}
    </SightInLoader>
  );
}
