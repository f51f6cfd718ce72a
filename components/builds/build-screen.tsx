import { useRouter } from 'expo-router';
import { useState } from 'react';

import { useMe } from '@/components/auth/api';
import { useBow } from '@/components/bows/api';
import { useBowRole } from '@/components/bows/use-bow-role';
import { useBuild, useDeleteBuild } from '@/components/builds/api';
import { BuildForm } from '@/components/builds/build-form';
import { AddedByLine } from '@/components/clients/added-by';
import { Button } from '@/components/ui/button';
import { ConfirmBar } from '@/components/ui/confirm-bar';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { Text } from '@/components/ui/text';

/**
 * An arrow build: its components and live totals, editable by the bow's owner
 * (delete asks first); read-only for a technician the bow is shared with.
 */
export function BuildScreen({ buildId }: { buildId: number }) {
  const router = useRouter();
  const me = useMe();
  const build = useBuild(buildId);
  const bow = useBow(build.data?.bowId);
  const { isOwner } = useBowRole(bow.data);
  const remove = useDeleteBuild();
  const [asking, setAsking] = useState(false);

  if (!Number.isInteger(buildId) || buildId <= 0) return <NotFoundScreen />;
  if (build.isError || bow.isError) {
    const failed = build.isError ? build : bow;
    return (
      <>
        <ScreenTitle name="Arrow build" />
        <ErrorView
          title="The build could not be loaded"
          error={failed.error}
          onRetry={() => failed.refetch()}
          retrying={failed.isFetching}
        />
      </>
    );
  }
  if (build.isPending || bow.isPending || !me.data) {
    return (
      <>
        <ScreenTitle name="Arrow build" />
        <LoadingView label="Loading the build…" />
      </>
    );
  }
  const data = build.data;
  const back = () => router.replace(`/bows/${data.bowId}`);
  const used = data.sightInCount > 0;
  return (
    <Screen>
      <ScreenTitle name={data.name} />
      <SectionHeading
        level={1}
        title={data.name}
        description={
          !isOwner
            ? `Arrow build of ${bow.data.ownerName || 'the archer'}: only they can change it.`
            : used
              ? `Used by ${data.sightInCount} ${data.sightInCount === 1 ? 'sight-in' : 'sight-ins'}: a change here may move their marks.`
              : 'Arrow build'
        }
        action={<Button label="Back to the bow" variant="quiet" href={`/bows/${data.bowId}`} />}
      />
      <AddedByLine addedBy={data.addedBy} meId={me.data.id} testID="build-added-by" />
      <BuildForm
        key={data.updatedAt}
        bowId={data.bowId}
        build={data}
        lengthUnit={me.data.lengthUnit}
        onSaved={back}
        onCancel={back}
        readOnly={!isOwner}
      />
      {!isOwner ? null : used ? (
        <Text variant="small" tone="soft">
          Sight-ins use this build, so it cannot be deleted while they exist: their marks were shot with this arrow.
        </Text>
      ) : asking ? (
        <ConfirmBar
          title={`Delete ${data.name}?`}
          message="This deletes the build. It cannot be undone."
          confirmLabel="Delete for good"
          pendingLabel="Deleting…"
          pending={remove.isPending}
          error={remove.isError ? remove.error.message : null}
          onConfirm={() => remove.mutate(data, { onSuccess: back })}
          onCancel={() => setAsking(false)}
        />
      ) : (
        <Button label="Delete this build" variant="quiet" onPress={() => setAsking(true)} testID="build-delete" />
      )}
    </Screen>
  );
}
