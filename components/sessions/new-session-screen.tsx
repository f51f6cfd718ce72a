import { useMe } from '@/components/auth/api';
import { useBow } from '@/components/bows/api';
import { useBowRole } from '@/components/bows/use-bow-role';
import { SessionEditor } from '@/components/sessions/session-editor';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';

/** Start a sight-in on a bow: enter marks, watch the fit, save. */
export function NewSessionScreen({ bowId, buildId }: { bowId: number; buildId?: number }) {
  const me = useMe();
  const bow = useBow(bowId);
  const { isOwner } = useBowRole(bow.data);
  if (!Number.isInteger(bowId) || bowId <= 0) return <NotFoundScreen />;
  if (bow.isPending || !me.data) {
    return (
      <>
        <ScreenTitle name="Sight-in" />
        <LoadingView label="Loading the bow…" />
      </>
    );
  }
  if (bow.isError) {
    return (
      <>
        <ScreenTitle name="Sight-in" />
        <ErrorView title="The bow could not be loaded" error={bow.error} onRetry={() => bow.refetch()} retrying={bow.isFetching} />
      </>
    );
  }
  const data = bow.data;
  return (
    <Screen>
      <ScreenTitle name="Sight-in" />
      <SectionHeading level={1} title="New sight-in" description={`${data.nickname}: two marks, a short and a long one, are enough to start.`} />
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
        <SessionEditor bow={data} initialBuildId={buildId} distanceUnit={me.data.distanceUnit} addOnly={!isOwner} />
      )}
    </Screen>
  );
}
