import { useRouter } from 'expo-router';
import { useState } from 'react';

import { useMe } from '@/components/auth/api';
import { useBuild, useDeleteBuild } from '@/components/builds/api';
import { BuildForm } from '@/components/builds/build-form';
import { Button } from '@/components/ui/button';
import { ConfirmBar } from '@/components/ui/confirm-bar';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { Text } from '@/components/ui/text';

/** An arrow build: its components and live totals, editable; delete asks first. */
export function BuildScreen({ buildId }: { buildId: number }) {
  const router = useRouter();
  const me = useMe();
  const build = useBuild(buildId);
  const remove = useDeleteBuild();
  const [asking, setAsking] = useState(false);

  if (!Number.isInteger(buildId) || buildId <= 0) return <NotFoundScreen />;
  if (build.isPending || !me.data) {
    return (
      <>
        <ScreenTitle name="Arrow build" />
        <LoadingView label="Loading the build…" />
      </>
    );
  }
  if (build.isError) {
    return (
      <>
        <ScreenTitle name="Arrow build" />
        <ErrorView title="The build could not be loaded" error={build.error} onRetry={() => build.refetch()} retrying={build.isFetching} />
      </>
    );
  }
  const data = build.data;
  const back = () => router.replace(`/bows/${data.bowId}`);
  const used = data.sessionCount > 0;
  return (
    <Screen>
      <ScreenTitle name={data.name} />
      <SectionHeading
        level={1}
        title={data.name}
        description={used ? `Used by ${data.sessionCount} ${data.sessionCount === 1 ? 'sight-in' : 'sight-ins'}: a change here may move their marks.` : 'Arrow build'}
        action={<Button label="Back to the bow" variant="quiet" href={`/bows/${data.bowId}`} />}
      />
      <BuildForm key={data.updatedAt} bowId={data.bowId} build={data} lengthUnit={me.data.lengthUnit} onSaved={back} onCancel={back} />
      {used ? (
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
        <Button label="Delete this build" variant="quiet" onPress={() => setAsking(true)} />
      )}
    </Screen>
  );
}
