import { StyleSheet, View } from 'react-native';

import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { space } from '@/components/theme';

export interface PrintSheetScreenProps {
  /** The sight-in whose sheet to print (absent for the try-it sheet). */
  sightInId?: number;
  /** The layout query for the sheet (from, to, step, unit, orientation, width, mirror, paper, label). */
  query: string;
  /** 'try': the visitor's sheet, whose request the try-it page left in sight-in storage. */
  source?: 'try';
}

// Printing at true size needs the browser's print dialog and CSS @page, so it lives in
// print-sheet-screen.web.tsx; a native build offers the PDF (printed from the system viewer).
/** The print page outside the web: a pointer to the PDF, which prints at actual size from any viewer. */
export function PrintSheetScreen({ sightInId, query }: PrintSheetScreenProps) {
  return (
    <View style={styles.box}>
      <Text variant="heading">Print the sheet</Text>
      <Banner tone="info">Printing at true size works from the web app. Open the PDF and print it at 100 %.</Banner>
      {sightInId ? <Button label="Back to the tape" href={`/sight-ins/${sightInId}/tape?${query}`} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { padding: space.xl, gap: space.lg },
});
