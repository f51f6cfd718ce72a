import { useState } from 'react';
import { StyleSheet, TextInput, View } from 'react-native';

import { useMe } from '@/components/auth/api';
import { useBow } from '@/components/bows/api';
import { usePreviewImport, useImportMarks } from '@/components/import-export/api';
import { CsvFilePicker } from '@/components/import-export/csv-file-picker';
import { ImportRows } from '@/components/import-export/import-rows';
import { useSightIn } from '@/components/sight-ins/api';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { Text } from '@/components/ui/text';
import { borders, colors, fonts, radii, space } from '@/components/theme';
import type { DistanceUnit } from '@/shared/auth';
import { importMaxBytes, importMaxRows, type ImportResult } from '@/shared/csv';

const example = 'distance,reading,arrows,note\n20,12.4,3,\n40 yd,27.9,3,light wind\n50 m,39.1,4,"metric lane, calm"';

/**
 * Import marks into a sight-in from a CSV file: choose or paste the file,
 * check it (each row's problem in plain words, nothing saved), then add all
 * its marks at once.
 * Example: `<MarksImportScreen sightInId={9} />`
 */
export function MarksImportScreen({ sightInId }: { sightInId: number }) {
  const me = useMe();
  const sightIn = useSightIn(sightInId);
  const bow = useBow(sightIn.data?.bowId);
  const preview = usePreviewImport(sightInId);
  const save = useImportMarks(sightInId);
  const [csv, setCsv] = useState('');
  const [fileName, setFileName] = useState<string | null>(null);
  const [unit, setUnit] = useState<DistanceUnit | null>(null);
  const [checked, setChecked] = useState<ImportResult | null>(null);

  if (!Number.isInteger(sightInId) || sightInId <= 0) return <NotFoundScreen />;
  if (sightIn.isError)
    return <ErrorView title="The sight-in could not be loaded" error={sightIn.error} onRetry={() => sightIn.refetch()} />;
  if (sightIn.isPending || !me.data) return <LoadingView label="Loading the sight-in…" />;

  const chosenUnit = unit ?? me.data.distanceUnit;
  const change = (text: string, name: string | null) => {
    setCsv(text);
    setFileName(name);
    setChecked(null);
    save.reset();
  };
  const check = () => preview.mutate({ csv, unit: chosenUnit }, { onSuccess: setChecked });
  const ready = checked !== null && checked.errorCount === 0 && !checked.fileProblem && checked.okCount > 0;

  return (
    <Screen testID="marks-import">
      <ScreenTitle name="Import marks" />
      <SectionHeading
        level={1}
        title="Import marks from a CSV file"
        description={[bow.data?.nickname, `sight-in of ${sightIn.data.date}`].filter(Boolean).join(' · ')}
        action={<Button label="Back to the sight-in" variant="quiet" href={`/sight-ins/${sightInId}`} />}
      />
      <Card tone="flat">
        <Text variant="label">What the file looks like</Text>
        <Text variant="small">
          {`One mark a row: distance, scale reading in mm, then optionally arrows shot and a note. A header row naming the columns is optional (without one, keep that order). Write the unit after a distance (“40 yd”, “35 m”) or in a unit column; otherwise the unit chosen below is used. At most ${importMaxRows} rows and ${importMaxBytes / 1024} KB.`}
        </Text>
        <Text style={styles.code}>{example}</Text>
      </Card>

      <SegmentedControl
        label="Distances without a unit are in"
        options={[
          { value: 'yd', label: 'Yards' },
          { value: 'm', label: 'Metres' },
        ]}
        value={chosenUnit}
        onChange={(value) => {
          setUnit(value);
          setChecked(null);
        }}
      />
      <View style={styles.row}>
        <CsvFilePicker onFile={(name, text) => change(text, name)} testID="csv-file" />
        {fileName ? <Text tone="soft">{fileName}</Text> : null}
      </View>
      <View style={styles.field}>
        <Text variant="label" nativeID="csv-paste-label">
          Or paste the rows
        </Text>
        <TextInput
          aria-labelledby="csv-paste-label"
          multiline
          value={csv}
          onChangeText={(text) => change(text, null)}
          placeholder={example}
          placeholderTextColor={colors.inkSoft}
          style={styles.paste}
          autoCapitalize="none"
          autoCorrect={false}
          testID="csv-paste"
        />
      </View>
      <View style={styles.row}>
        <Button
          label="Check the file"
          pendingLabel="Checking…"
          pending={preview.isPending}
          disabled={csv.trim() === ''}
          onPress={check}
          variant={ready ? 'secondary' : 'primary'}
          testID="check-csv"
        />
        {ready ? (
          <Button
            label={`Add ${checked.okCount} mark${checked.okCount === 1 ? '' : 's'}`}
            pendingLabel="Adding…"
            pending={save.isPending}
            onPress={() => save.mutate({ csv, unit: chosenUnit }, { onSuccess: () => setChecked(null) })}
            testID="save-csv"
          />
        ) : null}
      </View>

      {preview.isError ? (
        <Banner tone="error" title="The file could not be checked">
          {preview.error.message}
        </Banner>
      ) : null}
      {save.isError ? (
        <Banner tone="error" title="Nothing was imported">
          {save.error.message}
        </Banner>
      ) : null}
      {save.isSuccess ? (
        <Banner
          tone="info"
          title="Marks added"
          testID="import-done"
          action={<Button label="Open the sight-in" href={`/sight-ins/${sightInId}`} />}
        >
          {`${save.data.okCount} mark${save.data.okCount === 1 ? ' was' : 's were'} added and the fit was worked out again.`}
        </Banner>
      ) : null}
      {checked ? (
        <View style={styles.field}>
          {checked.fileProblem ? (
            <Banner tone="error" title="The file as a whole">
              {checked.fileProblem}
            </Banner>
          ) : null}
          {checked.rows.length ? (
            <Text variant="label">
              {checked.errorCount === 0
                ? `All ${checked.okCount} rows are ready. Nothing is saved until you add them.`
                : `${checked.okCount} row${checked.okCount === 1 ? ' is' : 's are'} ready, ${checked.errorCount} ${checked.errorCount === 1 ? 'has a problem' : 'have problems'}. Correct the file and check it again; nothing is saved until every row is right.`}
            </Text>
          ) : null}
          <ImportRows rows={checked.rows} />
        </View>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  field: { gap: space.sm },
  code: { fontFamily: 'monospace', fontSize: 14, lineHeight: 20, color: colors.ink },
  paste: {
    minHeight: 140,
    padding: space.md,
    borderRadius: radii.md,
    borderWidth: borders.control,
    borderColor: colors.lineStrong,
    backgroundColor: colors.surface,
    fontFamily: fonts.body,
    fontSize: 15,
    color: colors.ink,
    textAlignVertical: 'top',
  },
});
