import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { useMe } from '@/components/auth/api';
import { SignOutButton } from '@/components/auth/sign-out-button';
import { AuthFrame } from '@/components/auth/auth-frame';
import { applyServerErrors } from '@/components/auth/server-errors';
import { SignInForm } from '@/components/auth/sign-in-form';
import { useAcceptInvite, useAcceptWithNewAccount, useInvitePreview } from '@/components/shares/api';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormField } from '@/components/ui/form-field';
import { LoadingView } from '@/components/ui/loading-view';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { space } from '@/components/theme';
import { passwordMinLength } from '@/shared/auth';
import { inviteSignUpSchema, type InvitePreview, type InviteSignUp, type Share } from '@/shared/share';
import { emailInputProps } from '@/components/ui/email-input-props';

const day = (iso: string) => new Date(iso).toLocaleDateString(undefined, { dateStyle: 'medium' });

function Accepted({ share, invite }: { share: Share; invite: InvitePreview }) {
  return (
    <Banner
      tone="info"
      title="You are in"
      testID="invite-accepted"
      action={
        <View style={styles.row}>
          <Button label={`Open ${invite.bowNickname}`} href={`/bows/${share.bowId}`} testID="open-shared-bow" />
          <Button label="All clients" variant="secondary" href="/clients" />
        </View>
      }
    >
      {`${invite.archerName} shares ${invite.bowNickname} with you. You will find it under Clients.`}
    </Banner>
  );
}

function NewTechForm({ token, invite, onDone }: { token: string; invite: InvitePreview; onDone: (share: Share) => void }) {
  const create = useAcceptWithNewAccount();
  const [general, setGeneral] = useState<string | null>(null);
  const { control, handleSubmit, setError, setFocus } = useForm<InviteSignUp>({
    resolver: zodResolver(inviteSignUpSchema),
    defaultValues: { token, name: '', email: invite.invitedEmail, password: '' },
  });
  const submit = handleSubmit((values) => {
    setGeneral(null);
    create.mutate(values, {
      onSuccess: ({ share }) => onDone(share),
      onError: (error) => setGeneral(applyServerErrors(error, ['name', 'email', 'password'], setError)),
    });
  });
  return (
    <View style={styles.form}>
      {general ? (
        <Banner tone="error" title="Could not create the account">
          {general}
        </Banner>
      ) : null}
      <FormField
        control={control}
        name="name"
        label="Name"
        hint="Shown to the archers who share bows with you, e.g. your name and shop."
        autoComplete="name"
        returnKeyType="next"
        onSubmitEditing={() => setFocus('password')}
      />
      <FormField control={control} name="email" label="E-mail" hint="The invited address." {...emailInputProps} />
      <FormField
        control={control}
        name="password"
        label="Password"
        hint={`At least ${passwordMinLength} characters. A short sentence works well.`}
        autoComplete="new-password"
        secureTextEntry
        returnKeyType="go"
        onSubmitEditing={submit}
      />
      <Button
        label="Create the account and accept"
        pendingLabel="Creating…"
        pending={create.isPending}
        onPress={submit}
        fullWidth
        testID="create-tech"
      />
    </View>
  );
}

/**
 * The page an invitation link opens (/invite?token=…): what is shared and by
 * whom, then accept — signed in as a technician, by signing in, or by
 * creating a technician account for the invited address.
 * Example: `<InviteScreen token={params.token} />`
 */
export function InviteScreen({ token }: { token: string | undefined }) {
  const me = useMe();
  const preview = useInvitePreview(token);
  const accept = useAcceptInvite();
  const [mode, setMode] = useState<'new' | 'existing'>('new');
  const [accepted, setAccepted] = useState<Share | null>(null);

  let body;
  if (!token) {
    body = (
      <Banner tone="error" title="This link is not complete">
        Open the link from the e-mail again, or copy the whole address into the browser.
      </Banner>
    );
  } else if (preview.isPending || me.isPending) {
    body = <LoadingView label="Reading the invitation…" />;
  } else if (preview.isError) {
    body = (
      <Banner tone="error" title="This invitation cannot be used" testID="invite-problem">
        {preview.error.message}
      </Banner>
    );
  } else if (accepted) {
    body = <Accepted share={accepted} invite={preview.data} />;
  } else {
    const invite = preview.data;
    const user = me.data ?? null;
    body = (
      <View style={styles.form}>
        <Text>{`${invite.archerName} would like you to see the records of the bow “${invite.bowNickname}” — set-up, arrow builds, sight-ins and level checks — and add to them. You will not be able to delete anything.`}</Text>
        <Text variant="small" tone="soft">{`Sent to ${invite.invitedEmail}. The link works once, until ${day(invite.expiresAt)}.`}</Text>
        {accept.isError ? (
          <Banner tone="error" title="Could not accept">
            {accept.error.message}
          </Banner>
        ) : null}
        {user && user.role === 'tech' ? (
          <>
            <Text>{`Signed in as ${user.name} (${user.email}).`}</Text>
            <Button
              label="Accept the invitation"
              pendingLabel="Accepting…"
              pending={accept.isPending}
              onPress={() => accept.mutate(token, { onSuccess: setAccepted })}
              fullWidth
              testID="accept-invite"
            />
            <SignOutButton label="Sign out and use another account" variant="quiet" />
          </>
        ) : null}
        {user && user.role !== 'tech' ? (
          <>
            <Banner tone="warn" title="Invitations are for technician accounts">
              {`You are signed in as ${user.name} (${user.email}), which is not a technician account. Sign out, then sign in with your technician account or create one here.`}
            </Banner>
            <SignOutButton label="Sign out" variant="secondary" />
          </>
        ) : null}
        {!user ? (
          <>
            <SegmentedControl
              label="Your technician account"
              options={[
                { value: 'new', label: 'Create one' },
                { value: 'existing', label: 'I have one' },
              ]}
              value={mode}
              onChange={setMode}
            />
            {mode === 'new' ? (
              <NewTechForm token={token} invite={invite} onDone={setAccepted} />
            ) : (
              <SignInForm onSignedIn={() => accept.mutate(token, { onSuccess: setAccepted })} />
            )}
          </>
        ) : null}
      </View>
    );
  }

  return (
    <>
      <ScreenTitle name="Invitation" />
      <AuthFrame title="A bow shared with you" footer={<TextLink href="/" label="Go to Pinwright" />}>
        {body}
      </AuthFrame>
    </>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
