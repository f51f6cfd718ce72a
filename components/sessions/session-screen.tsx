import { useMe } from '@/components/auth/api';
import { useBow } from '@/components/bows/api';
import { useBowRole } from '@/components/bows/use-bow-role';
import { formatDay } from '@/components/bows/readiness-words';
import { useSession } from '@/components/sessions/api';
import { SessionEditor } from '@/components/sessions/session-editor';
import { Button } from '@/components/ui/button';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';

/** A saved sight-in: its marks (editable by the bow's owner; a technician adds marks), the live fit, and the way to its tape. */
export function SessionScreen({ sessionId }: { sessionId: number }) {
  const me = useMe();
  const session = useSession(sessionId);
  const bow = useBow(session.data?.bowId);
  const { isOwner } = useBowRole(bow.data);
  if (!Number.isInteger(sessionId) || sessionId <= 0) return <NotFoundScreen />;
  if (session.isError || bow.isError) {
    const failed = session.isError ? session : bow;
    return (
      <>
        <ScreenTitle name="Sight-in" />
        <ErrorView title="The sight-in could not be loaded" error={failed.error} onRetry={() => failed.refetch()} retrying={failed.isFetching} />
      </>
    );
  }
  if (session.isPending || bow.isPending || !me.data) {
    return (
      <>
        <ScreenTitle name="Sight-in" />
        <LoadingView label="Loading the sight-in…" />
      </>
    );
  }
  const data = session.data;
  return (
    <Screen>
      <ScreenTitle name={`Sight-in ${data.date}`} />
      <SectionHeading
        level={1}
        title={`Sight-in, ${formatDay(data.date)}`}
        description={[bow.data.nickname, data.placeLabel].filter(Boolean).join(' · ')}
        action={<Button label="Import marks (CSV)" variant="secondary" href={`/sessions/${data.id}/import`} testID="import-marks" />}
      />
      <SessionEditor key={data.id} bow={bow.data} session={data} distanceUnit={me.data.distanceUnit} addOnly={!isOwner} />
    </Screen>
  );
}
