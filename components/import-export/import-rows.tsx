import { StyleSheet, View } from 'react-native';

import { CheckIcon, ErrorIcon } from '@/components/ui/icons';
import { Text } from '@/components/ui/text';
import { borders, colors, radii, space } from '@/components/theme';
import type { ImportRow } from '@/shared/csv';

/**
 * The preview of an import: each row of the file with the mark it gives, or
 * what is wrong with it (icon and words, not colour alone).
 * Example: `<ImportRows rows={preview.rows} />`
 */
export function ImportRows({ rows }: { rows: ImportRow[] }) {
  return (
    <View style={styles.list} testID="import-rows">
      {rows.map((row) => (
        <View key={row.line} style={[styles.row, row.status === 'error' && styles.rowError]} testID={`import-line-${row.line}`}>
          {row.status === 'ok' ? <CheckIcon size={20} color={colors.verified} /> : <ErrorIcon size={20} color={colors.failed} />}
          <Text variant="label" style={styles.line}>{`Line ${row.line}`}</Text>
          <View style={styles.words}>
            {row.mark ? (
              <Text>
                {`${row.mark.distance} ${row.mark.unit} at ${row.mark.scaleMm} mm`}
                {row.mark.arrowsShot ? ` · ${row.mark.arrowsShot} arrows` : ''}
                {row.mark.note ? ` · “${row.mark.note}”` : ''}
              </Text>
            ) : null}
            {row.problems.map((problem) => (
              <Text key={problem} tone="failed">
                {problem}
              </Text>
            ))}
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.xs },
  row: {
    flexDirection: 'row',
    alignItems: 'flex-start',
    gap: space.sm,
    padding: space.sm,
    borderRadius: radii.sm,
    backgroundColor: colors.surface,
    borderWidth: borders.hairline,
    borderColor: colors.line,
  },
  rowError: { backgroundColor: colors.failedTint, borderColor: colors.failed },
  line: { width: 64 },
  words: { flex: 1, gap: space.xxs },
});
