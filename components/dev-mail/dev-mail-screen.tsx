import { useState } from 'react';
import { Pressable, ScrollView, StyleSheet, View } from 'react-native';

import { isApiError } from '@/components/api/client';
import { useMe } from '@/components/auth/api';
import { useClearDevMail, useDevMail, useDevMailMessage } from '@/components/dev-mail/api';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { DownloadLink } from '@/components/ui/download-link';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { Text } from '@/components/ui/text';
import { useWide } from '@/components/ui/use-wide';
import { borders, colors, fonts, layout, radii, space } from '@/components/theme';
import type { MailSummary } from '@/shared/dev-mail';

const time = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });

function MessageRow({ mail, selected, onSelect }: { mail: MailSummary; selected: boolean; onSelect: () => void }) {
  return (
    <Pressable
      role="button"
      aria-pressed={selected}
      onPress={onSelect}
      testID={`mail-${mail.id}`}
      style={({ hovered }: { pressed: boolean; hovered?: boolean }) => [styles.row, (selected || hovered) && styles.rowSelected]}
    >
      <Text variant="label" numberOfLines={2}>
        {mail.subject || '(no subject)'}
      </Text>
      <Text variant="small" tone="soft" numberOfLines={1}>
        To {mail.to.join(', ')} · {time(mail.receivedAt)}
        {mail.attachmentCount ? ` · ${mail.attachmentCount} attachment${mail.attachmentCount === 1 ? '' : 's'}` : ''}
      </Text>
    </Pressable>
  );
}

function MessageView({ id }: { id: string }) {
  const message = useDevMailMessage(id);
  if (message.isPending) return <LoadingView label="Opening the message…" />;
  if (message.isError) return <ErrorView title="The message could not be read" error={message.error} onRetry={() => message.refetch()} />;
  const mail = message.data;
  const appLinks = mail.links.filter((link) => link.appPath);
  return (
    <View style={styles.message} testID="mail-message">
      <Text variant="title" role="heading" aria-level={2}>
        {mail.subject}
      </Text>
      <Text variant="small" tone="soft">
        From {mail.from} · to {mail.to.join(', ')} · {time(mail.receivedAt)}
      </Text>
      {appLinks.length ? (
        <View style={styles.actions}>
          {appLinks.map((link) => (
            <Button key={link.href} label="Open the link in this app" href={link.appPath as never} testID="mail-open-link" />
          ))}
        </View>
      ) : null}
      {mail.attachments.length ? (
        <View style={styles.actions}>
          {mail.attachments.map((attachment, index) => (
            <DownloadLink
              key={`${attachment.filename}-${index}`}
              label={`${attachment.filename} (${Math.ceil(attachment.sizeBytes / 1024)} KB)`}
              href={`/api/dev/mail/${mail.id}/attachments/${index}`}
              fileName={attachment.filename}
            />
          ))}
        </View>
      ) : null}
      <View style={styles.body}>
        <Text style={styles.bodyText} selectable testID="mail-text">
          {mail.text ?? '(This message has no plain-text part.)'}
        </Text>
      </View>
    </View>
  );
}

/**
 * Development only: the e-mail the app sent, as the local fake SMTP service
 * received it (nothing is delivered). Links that point at this app open here.
 */
export function DevMailScreen() {
  const mail = useDevMail();
  const me = useMe();
  const admin = me.data?.role === 'admin';
  const clear = useClearDevMail();
  const wide = useWide();
  const [selected, setSelected] = useState<string | null>(null);

  let content;
  if (mail.isPending) content = <LoadingView label="Reading the mailbox…" />;
  else if (mail.isError) {
    content = isApiError(mail.error, 404) ? (
      <Banner tone="info" title="Not available">
        The mail reader is only there in development; this server sends real e-mail.
      </Banner>
    ) : isApiError(mail.error, 401) ? (
      <View style={styles.signIn} testID="mail-sign-in">
        <Banner tone="info" title="Sign in to read your e-mail">
          Like a mail program, this reader shows only the messages sent to the address you are signed in with.
        </Banner>
        <Button label="Sign in" href="/sign-in" />
      </View>
    ) : (
      <ErrorView title="The mailbox could not be read" error={mail.error} onRetry={() => mail.refetch()} />
    );
  } else if (mail.data.length === 0) {
    content = (
      <EmptyState
        title="No e-mail yet"
        message={`Messages the app sends to ${admin ? 'anyone' : (me.data?.email ?? 'your address')} (invitations, reset links, tapes) appear here within a few seconds.`}
      />
    );
  } else {
    const openId = selected ?? (wide ? mail.data[0].id : null);
    const list = (
      <View style={styles.list}>
        {mail.data.map((item) => (
          <MessageRow key={item.id} mail={item} selected={item.id === openId} onSelect={() => setSelected(item.id)} />
        ))}
      </View>
    );
    content = wide ? (
      <View style={styles.split}>
        <View style={styles.listColumn}>{list}</View>
        <View style={styles.detailColumn}>{openId ? <MessageView id={openId} /> : null}</View>
      </View>
    ) : openId ? (
      <View style={styles.phone}>
        <Button label="All messages" variant="quiet" onPress={() => setSelected(null)} />
        <MessageView id={openId} />
      </View>
    ) : (
      list
    );
  }

  return (
    <ScrollView style={styles.fill} contentContainerStyle={styles.scroll}>
      <ScreenTitle name="Sent e-mail (development)" />
      <View style={styles.column}>
        <SectionHeading
          level={1}
          title="Sent e-mail"
          description={`Development only: what the app sent${admin ? '' : ' to your address'}, caught by the local mail service. Nothing here was delivered.`}
          action={
            admin && mail.data?.length ? (
              <Button label="Empty the mailbox" variant="secondary" pending={clear.isPending} onPress={() => clear.mutate()} />
            ) : undefined
          }
        />
        <Button label="Back to the app" variant="quiet" href="/" />
        {content}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1, backgroundColor: colors.paper },
  scroll: { padding: space.lg, paddingBottom: space.xxxl, alignItems: 'center' },
  column: { width: '100%', maxWidth: layout.contentMax, gap: space.lg },
  list: { gap: space.xs },
  row: {
    padding: space.md,
    minHeight: layout.minTap,
    borderRadius: radii.md,
    backgroundColor: colors.surface,
    borderWidth: borders.hairline,
    borderColor: colors.line,
    gap: space.xxs,
  },
  rowSelected: { backgroundColor: colors.signalTint, borderColor: colors.signal },
  split: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  listColumn: { flexBasis: 360, flexShrink: 1 },
  detailColumn: { flex: 1, minWidth: 0 },
  phone: { gap: space.md },
  signIn: { gap: space.md, alignItems: 'flex-start' },
  message: { gap: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  body: {
    padding: space.lg,
    borderRadius: radii.md,
    backgroundColor: colors.surface,
    borderWidth: borders.hairline,
    borderColor: colors.line,
  },
  bodyText: { fontFamily: fonts.body, fontSize: 15, lineHeight: 22 },
});
