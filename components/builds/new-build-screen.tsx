import { useRouter } from 'expo-router';

import { useMe } from '@/components/auth/api';
import { useBow } from '@/components/bows/api';
import { OwnerOnlyNotice } from '@/components/bows/owner-only-notice';
import { useBowRole } from '@/components/bows/use-bow-role';
import { BuildForm } from '@/components/builds/build-form';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';

/** Add an arrow build to a bow; on save, back to the bow. */
export function NewBuildScreen({ bowId }: { bowId: number }) {
  const router = useRouter();
  const me = useMe();
  const bow = useBow(bowId);
  const { isOwner } = useBowRole(bow.data);
  if (!Number.isInteger(bowId) || bowId <= 0) return <NotFoundScreen />;
  if (bow.isPending || !me.data) {
    return (
      <>
        <ScreenTitle name="Add a build" />
        <LoadingView label="Loading the bow…" />
      </>
    );
  }
  if (bow.isError) {
    return (
      <>
        <ScreenTitle name="Add a build" />
        <ErrorView title="The bow could not be loaded" error={bow.error} onRetry={() => bow.refetch()} retrying={bow.isFetching} />
      </>
    );
  }
  if (!isOwner) {
    return (
      <Screen>
        <ScreenTitle name="Add a build" />
        <OwnerOnlyNotice bow={bow.data} what="add arrow builds to this bow" />
      </Screen>
    );
  }
  const back = () => router.replace(`/bows/${bowId}`);
  return (
    <Screen>
      <ScreenTitle name="Add a build" />
      <SectionHeading level={1} title="Add an arrow build" description={`For ${bow.data.nickname}. The fit uses the arrow's weight and diameter.`} />
      <BuildForm bowId={bowId} lengthUnit={me.data.lengthUnit} onSaved={back} onCancel={back} />
    </Screen>
  );
}
