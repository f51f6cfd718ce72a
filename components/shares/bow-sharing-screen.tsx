import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { useMe } from '@/components/auth/api';
import { applyServerErrors } from '@/components/auth/server-errors';
import { useBow } from '@/components/bows/api';
import { BowExportLinks } from '@/components/import-export/bow-export-links';
import { useBowAudit, useBowShares, useInviteTech, useRevokeShare } from '@/components/shares/api';
import { AuditList } from '@/components/shares/audit-list';
import { ShareStateBadge } from '@/components/shares/share-state-badge';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmBar } from '@/components/ui/confirm-bar';
import { ErrorView } from '@/components/ui/error-view';
import { FormField } from '@/components/ui/form-field';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { Text } from '@/components/ui/text';
import { space } from '@/components/theme';
import { inviteValidDays, shareInviteSchema, type Share, type ShareInvite } from '@/shared/share';
import { emailInputProps } from '@/components/ui/email-input-props';

const day = (iso: string) => new Date(iso).toLocaleDateString(undefined, { dateStyle: 'medium' });

function InviteForm({ bowId }: { bowId: number }) {
  const invite = useInviteTech(bowId);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { control, handleSubmit, setError, reset } = useForm<ShareInvite>({
    resolver: zodResolver(shareInviteSchema),
    defaultValues: { email: '' },
  });
  const submit = handleSubmit((values) => {
    setSentTo(null);
    invite.mutate(values, {
      onSuccess: (share) => {
        setSentTo(share.invitedEmail);
        reset({ email: '' });
      },
      onError: (error) => applyServerErrors(error, ['email'], setError),
    });
  });
  return (
    <Card>
      <SectionHeading
        title="Invite a technician"
        level={2}
        description={`They get an e-mail with a link that works once, for ${inviteValidDays} days. They will see this bow’s records and can add sight-ins, marks, level checks and notes, but never delete yours.`}
      />
      {sentTo ? (
        <Banner tone="info" title="Invitation sent" testID="invite-sent">
          {`We e-mailed ${sentTo}. The share starts when they accept.`}
        </Banner>
      ) : null}
      {invite.isError && !invite.error.fields.email ? (
        <Banner tone="error" title="Could not invite">
          {invite.error.message}
        </Banner>
      ) : null}
      <FormField
        control={control}
        name="email"
        label="Technician’s e-mail"
        {...emailInputProps}
        returnKeyType="send"
        onSubmitEditing={submit}
      />
      <View style={styles.row}>
        <Button label="Send the invitation" pendingLabel="Sending…" pending={invite.isPending} onPress={submit} testID="send-invite" />
      </View>
    </Card>
  );
}

function ShareRow({ share, bowId }: { share: Share; bowId: number }) {
  const revoke = useRevokeShare();
  const invite = useInviteTech(bowId);
  const [asking, setAsking] = useState(false);
  const who = share.tech ? `${share.tech.name} (${share.tech.email})` : share.invitedEmail;
  const dates = [
    `Invited ${day(share.invitedAt)}`,
    share.acceptedAt ? `accepted ${day(share.acceptedAt)}` : null,
    share.revokedAt ? `ended ${day(share.revokedAt)}` : null,
    share.state === 'invited' && share.inviteExpiresAt ? `link works until ${day(share.inviteExpiresAt)}` : null,
  ]
    .filter(Boolean)
    .join(' · ');
  return (
    <Card testID={`share-${share.id}`}>
      <View style={styles.shareTop}>
        <Text variant="label" style={styles.who}>
          {who}
        </Text>
        <ShareStateBadge state={share.state} />
      </View>
      <Text variant="small" tone="soft">
        {dates}
      </Text>
      {share.state !== 'revoked' && !asking ? (
        <View style={styles.row}>
          {share.state === 'invited' ? (
            <Button
              label="Send again"
              variant="secondary"
              pending={invite.isPending}
              pendingLabel="Sending…"
              onPress={() => invite.mutate({ email: share.invitedEmail })}
            />
          ) : null}
          <Button
            label={share.state === 'active' ? 'End the share' : 'Withdraw the invitation'}
            variant="danger"
            onPress={() => setAsking(true)}
            testID={`revoke-${share.id}`}
          />
        </View>
      ) : null}
      {invite.isSuccess ? <Text variant="small">A fresh link is on its way; the old one no longer works.</Text> : null}
      {asking ? (
        <ConfirmBar
          title={share.state === 'active' ? `End the share with ${share.tech?.name ?? share.invitedEmail}?` : 'Withdraw the invitation?'}
          message={
            share.state === 'active'
              ? 'They lose access to this bow at once. What they added stays on the bow and in its log.'
              : 'The link in their e-mail will stop working.'
          }
          confirmLabel={share.state === 'active' ? 'End the share' : 'Withdraw'}
          pendingLabel="Ending…"
          pending={revoke.isPending}
          error={revoke.isError ? revoke.error.message : null}
          onConfirm={() => revoke.mutate(share.id, { onSuccess: () => setAsking(false) })}
          onCancel={() => setAsking(false)}
          testID={`confirm-revoke-${share.id}`}
        />
      ) : null}
    </Card>
  );
}

/**
 * A bow's sharing, for its archer: invite a technician, see and end shares,
 * read the log of what technicians did on the bow, take the records out.
 * Example: `<BowSharingScreen bowId={3} />`
 */
export function BowSharingScreen({ bowId }: { bowId: number }) {
  const me = useMe();
  const bow = useBow(bowId);
  const owner = Boolean(me.data && bow.data && bow.data.userId === me.data.id);
  const shares = useBowShares(bowId, owner);
  const audit = useBowAudit(bowId, owner);

  if (!Number.isInteger(bowId) || bowId <= 0) return <NotFoundScreen />;
  if (bow.isPending || !me.data) return <LoadingView label="Loading the bow…" />;
  if (bow.isError) return <ErrorView title="The bow could not be loaded" error={bow.error} onRetry={() => bow.refetch()} />;

  const nickname = bow.data.nickname;
  const back = <Button label={`Back to ${nickname}`} variant="quiet" href={`/bows/${bowId}`} />;
  if (!owner) {
    return (
      <Screen width="form">
        <ScreenTitle name={`Sharing · ${nickname}`} />
        <SectionHeading level={1} title="Sharing" description={nickname} action={back} />
        <Banner tone="info" title="Shared with you">
          Only the bow’s archer invites technicians and reads its log. You can add sight-ins, marks, level checks and notes.
        </Banner>
        <BowExportLinks bowId={bowId} />
      </Screen>
    );
  }

  const open = shares.data?.filter((share) => share.state !== 'revoked') ?? [];
  const ended = shares.data?.filter((share) => share.state === 'revoked') ?? [];
  return (
    <Screen testID="bow-sharing">
      <ScreenTitle name={`Sharing · ${nickname}`} />
      <SectionHeading level={1} title="Sharing and records" description={nickname} action={back} />
      <InviteForm bowId={bowId} />

      <View style={styles.section}>
        <SectionHeading title="Shared with" level={2} />
        {shares.isPending ? <LoadingView label="Loading the shares…" /> : null}
        {shares.isError ? <ErrorView title="The shares could not be loaded" error={shares.error} onRetry={() => shares.refetch()} /> : null}
        {shares.data && open.length === 0 ? <Text tone="soft">Nobody. This bow’s records are yours alone.</Text> : null}
        {open.map((share) => (
          <ShareRow key={share.id} share={share} bowId={bowId} />
        ))}
        {ended.length ? (
          <Text variant="small" tone="soft">
            {`Ended: ${ended.map((share) => share.tech?.name ?? share.invitedEmail).join(', ')}.`}
          </Text>
        ) : null}
      </View>

      <View style={styles.section}>
        <SectionHeading
          title="What was done on this bow"
          level={2}
          description="Everything a technician added or changed, and each invitation and share."
        />
        {audit.isPending ? <LoadingView label="Loading the log…" /> : null}
        {audit.isError ? <ErrorView title="The log could not be loaded" error={audit.error} onRetry={() => audit.refetch()} /> : null}
        {audit.data && audit.data.entries.length === 0 ? <Text tone="soft">Nothing yet.</Text> : null}
        {audit.data ? <AuditList entries={audit.data.entries} testID="bow-audit" /> : null}
      </View>

      <BowExportLinks bowId={bowId} />
    </Screen>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  section: { gap: space.sm },
  shareTop: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  who: { flexShrink: 1 },
});
