import { StyleSheet, View } from 'react-native';

import { exportPaths } from '@/components/import-export/api';
import { DownloadLink } from '@/components/ui/download-link';
import { SectionHeading } from '@/components/ui/section-heading';
import { space } from '@/components/theme';

/**
 * Downloads of a bow's builds, sight-ins and marks: one CSV table (one row per
 * mark) for a spreadsheet, or the whole structure as JSON.
 * Example: `<BowExportLinks bowId={3} />`
 */
export function BowExportLinks({ bowId }: { bowId: number }) {
  return (
    <View style={styles.box}>
      <SectionHeading
        title="Take the records with you"
        level={2}
        description="Builds, sight-ins and marks: a CSV table for a spreadsheet (one row per mark), or everything as JSON."
      />
      <View style={styles.row}>
        <DownloadLink label="Download CSV" href={exportPaths.csv(bowId)} testID="export-csv" />
        <DownloadLink label="Download JSON" href={exportPaths.json(bowId)} testID="export-json" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
