import { BowLoader } from '@/components/bows/bow-loader';
import { SightInEditor } from '@/components/sight-ins/sight-in-editor';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';

/** Start a sight-in on a bow: enter marks, watch the fit, save. */
export function NewSightInScreen({ bowId, buildId }: { bowId: number; buildId?: number }) {
  return (
    <BowLoader bowId={bowId} title="Sight-in">
      {({ me, bow: data, role: { isOwner } }) => (
        <Screen>
          <ScreenTitle name="Sight-in" />
          <SectionHeading
            level={1}
            title="New sight-in"
            description={`${data.nickname}: two marks, a short and a long one, are enough to start.`}
          />
          {data.builds.length === 0 ? (
            <EmptyState
              title="Add an arrow build first"
              message={
                isOwner
                  ? 'The fit needs the arrow’s weight and diameter.'
                  : `The fit needs the arrow’s weight and diameter; only ${data.ownerName || 'the archer'} can add a build to this bow.`
              }
              action={isOwner ? <Button label="Add a build" href={`/bows/${data.id}/builds/new`} /> : undefined}
            />
          ) : (
            <SightInEditor bow={data} initialBuildId={buildId} distanceUnit={me.distanceUnit} addOnly={!isOwner} />
          )}
        </Screen>
      )}
    </BowLoader>
  );
}
