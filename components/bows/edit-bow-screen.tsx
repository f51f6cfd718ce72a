import { useRouter } from 'expo-router';

import { useMe } from '@/components/auth/api';
import { useBow } from '@/components/bows/api';
import { BowForm } from '@/components/bows/bow-form';
import { OwnerOnlyNotice } from '@/components/bows/owner-only-notice';
import { useBowRole } from '@/components/bows/use-bow-role';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';

/** Edit a bow's set-up; on save, back to the bow. */
export function EditBowScreen({ bowId }: { bowId: number }) {
  const router = useRouter();
  const me = useMe();
  const bow = useBow(bowId);
  const { isOwner } = useBowRole(bow.data);
  const title = <ScreenTitle name="Edit bow" />;

  if (bow.isPending || !me.data) {
    return (
      <>
        {title}
        <LoadingView label="Loading the bow…" />
      </>
    );
  }
  if (bow.isError) {
    return (
      <>
        {title}
        <ErrorView title="The bow could not be loaded" error={bow.error} onRetry={() => bow.refetch()} retrying={bow.isFetching} />
      </>
    );
  }
  if (!isOwner) {
    return (
      <Screen>
        {title}
        <OwnerOnlyNotice bow={bow.data} what="change this bow’s set-up" />
      </Screen>
    );
  }
  const back = () => router.replace(`/bows/${bowId}`);
  return (
    <Screen>
      {title}
      <SectionHeading
        level={1}
        title={`Edit ${bow.data.nickname}`}
        description="A change to the sight or peep may move your marks: confirm them at the range."
      />
      <BowForm bow={bow.data} lengthUnit={me.data.lengthUnit} distanceUnit={me.data.distanceUnit} onSaved={back} onCancel={back} />
    </Screen>
  );
}
