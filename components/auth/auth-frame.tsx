import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';

import { Wordmark } from '@/components/shell/wordmark';
import { Text } from '@/components/ui/text';
import { useWide } from '@/components/ui/use-wide';
import { colors, layout, radii, space } from '@/components/theme';

export interface AuthFrameProps {
  /** The page's heading, e.g. "Sign in". */
  title: string;
  /** One line under the heading. */
  lead?: string;
  /** The form. */
  children: ReactNode;
  /** Links under the form (switch between sign-in and sign-up, try without an account). */
  footer?: ReactNode;
}

const points = [
  'Keep each bow, arrow build and sight-in in one place.',
  'Fit the arrow’s path from the marks you have sighted in.',
  'Print a true-scale sight tape on your own printer.',
];

/**
 * The frame of the signed-out pages: on a wide screen a slate panel about
 * Pinwright beside the form; on a phone the wordmark above the form.
 * Example: `<AuthFrame title="Sign in" footer={links}><SignInForm /></AuthFrame>`
 */
export function AuthFrame({ title, lead, children, footer }: AuthFrameProps) {
  const wide = useWide();

  const form = (
    <View style={styles.formColumn}>
      {!wide ? (
        <View style={styles.phoneBrand}>
          <Wordmark tone="ink" size={34} />
        </View>
      ) : null}
      <View style={styles.heading}>
        <Text variant="heading" role="heading" aria-level={1}>
          {title}
        </Text>
        {lead ? <Text tone="soft">{lead}</Text> : null}
      </View>
      {children}
      {footer ? <View style={styles.footer}>{footer}</View> : null}
    </View>
  );

  if (!wide) {
    return (
      <ScrollView style={styles.fill} contentContainerStyle={styles.phoneScroll} keyboardShouldPersistTaps="handled">
        {form}
      </ScrollView>
    );
  }

  return (
    <View style={styles.wideRoot}>
      <View style={styles.panel}>
        <Wordmark size={40} />
        <View style={styles.panelWords}>
          <Text variant="display" tone="onSlate">
            Your bow set-up, written down and worked out.
          </Text>
          {points.map((point) => (
            <View key={point} style={styles.point}>
              <View style={styles.pointPin} />
              <Text variant="lead" tone="onSlate" style={styles.pointText}>
                {point}
              </Text>
            </View>
          ))}
        </View>
        <Text variant="small" tone="onSlateMuted">
          A printed tape is an estimate until every distance you will shoot is confirmed at the range.
        </Text>
      </View>
      <ScrollView style={styles.fill} contentContainerStyle={styles.wideScroll} keyboardShouldPersistTaps="handled">
        {form}
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1 },
  phoneScroll: { flexGrow: 1, padding: space.lg, paddingTop: space.xl, paddingBottom: space.xxxl, alignItems: 'center' },
  wideScroll: { flexGrow: 1, padding: space.xxl, justifyContent: 'center', alignItems: 'center' },
  formColumn: { width: '100%', maxWidth: layout.formMax, gap: space.xl },
  phoneBrand: { paddingBottom: space.sm },
  heading: { gap: space.xs },
  footer: { gap: space.xxs, paddingTop: space.sm },
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: colors.paper },
  panel: {
    width: '42%',
    maxWidth: 560,
    backgroundColor: colors.slate,
    padding: space.xxxl,
    justifyContent: 'space-between',
    gap: space.xxl,
  },
  panelWords: { gap: space.xl, maxWidth: 440 },
  point: { flexDirection: 'row', gap: space.md, alignItems: 'flex-start' },
  pointPin: {
    width: 12,
    height: 12,
    marginTop: 8,
    borderRadius: radii.pill,
    backgroundColor: colors.signalOnSlate,
  },
  pointText: { flex: 1 },
});
