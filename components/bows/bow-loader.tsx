import type { ReactNode } from 'react';

import { useMe } from '@/components/auth/api';
import { useBow } from '@/components/bows/api';
import { useBowRole, type BowRole } from '@/components/bows/use-bow-role';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import type { User } from '@/shared/auth';
import type { BowDetail } from '@/shared/bow-detail';

/** What a bow's screens draw from, once everything has loaded. */
export interface LoadedBow {
  me: User;
  /** The bow, with its builds, sight-ins and tapes. */
  bow: BowDetail;
  /** What the signed-in user may do on the bow (see useBowRole). */
  role: BowRole;
}

export interface BowLoaderProps {
  bowId: number;
  /** The tab title while loading or failed, e.g. "Sight-in". */
  title: string;
  /** The heading of the error view; default "The bow could not be loaded". */
  failedTitle?: string;
  /** The loading view's words; default "Loading the bow…". */
  loadingLabel?: string;
  children: (loaded: LoadedBow) => ReactNode;
}

/**
 * Loads a bow and the account for a screen that works on the bow (a new
 * build, a new sight-in): not found for a bad id, the loading view until both
 * are in, the error view (with retry) when the bow's request fails; then
 * renders `children` with them.
 * Example: `<BowLoader bowId={3} title="Sight-in">{({ bow, me, role }) => …}</BowLoader>`
 */
export function BowLoader({
  bowId,
  title,
  failedTitle = 'The bow could not be loaded',
  loadingLabel = 'Loading the bow…',
  children,
}: BowLoaderProps) {
  const me = useMe();
  const bow = useBow(bowId);
  const role = useBowRole(bow.data);
  if (!Number.isInteger(bowId) || bowId <= 0) return <NotFoundScreen />;
  if (bow.isPending || !me.data) {
    return (
      <>
        <ScreenTitle name={title} />
        <LoadingView label={loadingLabel} />
      </>
    );
  }
  if (bow.isError) {
    return (
      <>
        <ScreenTitle name={title} />
        <ErrorView title={failedTitle} error={bow.error} onRetry={() => bow.refetch()} retrying={bow.isFetching} />
      </>
    );
  }
  return <>{children({ me: me.data, bow: bow.data, role })}</>;
}
