import type { ReactNode } from 'react';

import { useMe } from '@/components/auth/api';
import { useBow } from '@/components/bows/api';
import { useBowRole, type BowRole } from '@/components/bows/use-bow-role';
import { useSession } from '@/components/sessions/api';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import type { User } from '@/shared/auth';
import type { BowDetail } from '@/shared/bow';
import type { Session } from '@/shared/session';

/** What a sight-in's screens draw from, once everything has loaded. */
export interface LoadedSession {
  me: User;
  session: Session;
  /** The session's bow, with its builds and tapes. */
  bow: BowDetail;
  /** What the signed-in user may do on the bow (see useBowRole). */
  role: BowRole;
}

export interface SessionLoaderProps {
  sessionId: number;
  /** The tab title while loading or failed, e.g. "Tape". */
  title: string;
  /** The heading of the error view, e.g. "The tape could not be loaded". */
  failedTitle: string;
  /** The loading view's words, e.g. "Loading the fit…". */
  loadingLabel: string;
  children: (loaded: LoadedSession) => ReactNode;
}

/**
 * Loads a sight-in, its bow and the account for a screen that shows the
 * session (its marks, its tape): not found for a bad id, the error view (with
 * retry) when either request fails, the loading view until all three are in;
 * then renders `children` with them.
 * Example: `<SessionLoader sessionId={12} title="Tape" failedTitle="The tape could not be loaded" loadingLabel="Loading the fit…">{({ bow }) => …}</SessionLoader>`
 */
export function SessionLoader({ sessionId, title, failedTitle, loadingLabel, children }: SessionLoaderProps) {
  const me = useMe();
  const session = useSession(sessionId);
  const bow = useBow(session.data?.bowId);
  const role = useBowRole(bow.data);
  if (!Number.isInteger(sessionId) || sessionId <= 0) return <NotFoundScreen />;
  if (session.isError || bow.isError) {
    const failed = session.isError ? session : bow;
    return (
      <>
        <ScreenTitle name={title} />
        <ErrorView title={failedTitle} error={failed.error} onRetry={() => failed.refetch()} retrying={failed.isFetching} />
      </>
    );
  }
  if (session.isPending || bow.isPending || !me.data) {
    return (
      <>
        <ScreenTitle name={title} />
        <LoadingView label={loadingLabel} />
      </>
    );
  }
  return <>{children({ me: me.data, session: session.data, bow: bow.data, role })}</>;
}
