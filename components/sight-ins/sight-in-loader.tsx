import type { ReactNode } from 'react';

import { useMe } from '@/components/auth/api';
import { useBow } from '@/components/bows/api';
import { useBowRole, type BowRole } from '@/components/bows/use-bow-role';
import { useSightIn } from '@/components/sight-ins/api';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import type { User } from '@/shared/auth';
import type { BowDetail } from '@/shared/bow-detail';
import type { SightIn } from '@/shared/sight-in';

/** What a sight-in's screens draw from, once everything has loaded. */
export interface LoadedSightIn {
  me: User;
  sightIn: SightIn;
  /** The sight-in's bow, with its builds and tapes. */
  bow: BowDetail;
  /** What the signed-in user may do on the bow (see useBowRole). */
  role: BowRole;
}

export interface SightInLoaderProps {
  sightInId: number;
  /** The tab title while loading or failed, e.g. "Tape". */
  title: string;
  /** The heading of the error view, e.g. "The tape could not be loaded". */
  failedTitle: string;
  /** The loading view's words, e.g. "Loading the fit…". */
  loadingLabel: string;
  children: (loaded: LoadedSightIn) => ReactNode;
}

/**
 * Loads a sight-in, its bow and the account for a screen that shows the
 * sight-in (its marks, its tape): not found for a bad id, the error view (with
 * retry) when either request fails, the loading view until all three are in;
 * then renders `children` with them.
 * Example: `<SightInLoader sightInId={12} title="Tape" failedTitle="The tape could not be loaded" loadingLabel="Loading the fit…">{({ bow }) => …}</SightInLoader>`
 */
export function SightInLoader({ sightInId, title, failedTitle, loadingLabel, children }: SightInLoaderProps) {
  const me = useMe();
  const sightIn = useSightIn(sightInId);
  const bow = useBow(sightIn.data?.bowId);
  const role = useBowRole(bow.data);
  if (!Number.isInteger(sightInId) || sightInId <= 0) return <NotFoundScreen />;
  if (sightIn.isError || bow.isError) {
    const failed = sightIn.isError ? sightIn : bow;
    return (
      <>
        <ScreenTitle name={title} />
        <ErrorView title={failedTitle} error={failed.error} onRetry={() => failed.refetch()} retrying={failed.isFetching} />
      </>
    );
  }
  if (sightIn.isPending || bow.isPending || !me.data) {
    return (
      <>
        <ScreenTitle name={title} />
        <LoadingView label={loadingLabel} />
      </>
    );
  }
  return <>{children({ me: me.data, sightIn: sightIn.data, bow: bow.data, role })}</>;
}
