import { StyleSheet, View } from 'react-native';

import { VisitorBar } from '@/components/shell/visitor-bar';
import { ComingSoon } from '@/components/ui/coming-soon';
import { colors } from '@/components/theme';

/** Placeholder for the visitor's one-off tape from two marks (built later). */
export function TryScreen() {
  return (
    <View style={styles.root}>
      <VisitorBar />
      <ComingSoon
        title="Try a tape"
        message="Soon you can enter two sighted marks here and print a one-off sight tape without an account. Saving it will need an account."
        backHref="/sign-in"
        backLabel="Back to sign in"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.paper },
});
