import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useSendTape } from '@/components/import-export/api';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { SectionHeading } from '@/components/ui/section-heading';
import { TextField } from '@/components/ui/text-field';
import { space } from '@/components/theme';
import { emailSchema } from '@/shared/auth';
import { emailInputProps } from '@/components/ui/email-input-props';

export interface SendTapeFormProps {
  sightInId: number;
  /** The layout as the sheet download's query string (null while the layout cannot be drawn). */
  layoutQuery: string | null;
}

/**
 * E-mail the print sheet, exactly as the PDF download would draw it, to an
 * address (your own, to print elsewhere, or a friend's).
 * Example: `<SendTapeForm sightInId={9} layoutQuery="from=20&to=80&paper=a4" />`
 */
export function SendTapeForm({ sightInId, layoutQuery }: SendTapeFormProps) {
  const send = useSendTape(sightInId);
  const [to, setTo] = useState('');
  const [problem, setProblem] = useState<string | undefined>();
  const submit = () => {
    const parsed = emailSchema.safeParse(to);
    if (!parsed.success) return setProblem(parsed.error.issues[0].message);
    setProblem(undefined);
    send.mutate({ to: parsed.data, layout: layoutQuery ?? undefined });
  };
  return (
    <Card style={styles.box} testID="send-tape">
      <SectionHeading
        title="Send the sheet by e-mail"
        level={3}
        description="As a PDF, laid out as above. Print it at 100 % and measure its 50 mm bar before cutting."
      />
      <TextField
        label="Send to"
        value={to}
        onChangeText={(text) => {
          setTo(text);
          send.reset();
        }}
        error={problem ?? send.error?.fields.to}
        {...emailInputProps}
        onSubmitEditing={submit}
      />
      {send.isSuccess ? (
        <Banner tone="info" title="Sent">
          {send.data}
        </Banner>
      ) : null}
      {send.isError && !send.error.fields.to ? (
        <Banner tone="error" title="Could not send">
          {send.error.message}
        </Banner>
      ) : null}
      <View style={styles.row}>
        <Button
          label="Send the PDF"
          variant="secondary"
          pendingLabel="Sending…"
          pending={send.isPending}
          disabled={!layoutQuery}
          onPress={submit}
        />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md, flexBasis: '100%' },
  row: { flexDirection: 'row', gap: space.sm },
});
