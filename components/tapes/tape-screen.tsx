import { useMe } from '@/components/auth/api';
import { useBow } from '@/components/bows/api';
import { useBowRole } from '@/components/bows/use-bow-role';
import { formatDay } from '@/components/bows/readiness-words';
import { useSession } from '@/components/sessions/api';
import { TapeEditor } from '@/components/tapes/tape-editor';
import { Button } from '@/components/ui/button';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';

/** The tape of a sight-in: options, preview, print and downloads (a saved layout when `tapeId` is given). */
export function TapeScreen({ sessionId, tapeId }: { sessionId: number; tapeId?: number }) {
  const me = useMe();
  const session = useSession(sessionId);
  const bow = useBow(session.data?.bowId);
  const { isOwner } = useBowRole(bow.data);
  if (!Number.isInteger(sessionId) || sessionId <= 0) return <NotFoundScreen />;
  if (session.isError || bow.isError) {
    const failed = session.isError ? session : bow;
    return (
      <>
        <ScreenTitle name="Tape" />
        <ErrorView title="The tape could not be loaded" error={failed.error} onRetry={() => failed.refetch()} retrying={failed.isFetching} />
      </>
    );
  }
  if (session.isPending || bow.isPending || !me.data) {
    return (
      <>
        <ScreenTitle name="Tape" />
        <LoadingView label="Loading the fit…" />
      </>
    );
  }
  const tape = tapeId ? bow.data.tapes.find((item) => item.id === tapeId && item.sessionId === sessionId) : undefined;
  return (
    <Screen>
      <ScreenTitle name="Tape" />
      <SectionHeading
        level={1}
        title={tape?.label ? `Tape: ${tape.label}` : 'Sight tape'}
        description={`${bow.data.nickname} · sight-in of ${formatDay(session.data.date)}`}
        action={<Button label="Back to the sight-in" variant="quiet" href={`/sessions/${sessionId}`} />}
      />
      <TapeEditor
        key={tape?.id ?? 'new'}
        bow={bow.data}
        session={session.data}
        tape={tape}
        lengthUnit={me.data.lengthUnit}
        distanceUnit={me.data.distanceUnit}
        addOnly={!isOwner}
      />
    </Screen>
  );
}
