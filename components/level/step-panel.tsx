import { useState, type ReactNode } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { Image, Pressable, StyleSheet, View } from 'react-native';

import { textFormResolver } from '@/components/forms/text-form-resolver';
import { useRemoveStepPhoto, useSaveCheck, useUploadStepPhoto } from '@/components/level/api';
import { LevelDiagram } from '@/components/level/level-diagram';
import { resultLabels } from '@/components/level/level-words';
import { PhotoPicker } from '@/components/level/photo-picker';
import { bigTap, ResultButtons } from '@/components/level/result-buttons';
import { resultColors, resultIcons } from '@/components/level/result-icons';
import { stepGuides } from '@/components/level/step-guide';
import { stepTextFrom, stepTextSchema, type StepText } from '@/components/level/step-form';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormField } from '@/components/ui/form-field';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { Text } from '@/components/ui/text';
import { borders, colors, radii, space } from '@/components/theme';
import { levelStepKeys, readingUnitLabels, type LevelCheck, type LevelStepKey, type ReadingUnit, type StepEntry } from '@/shared/level';

const unitOptions = (Object.keys(readingUnitLabels) as ReadingUnit[]).map((value) => ({ value, label: readingUnitLabels[value] }));

function Guidance({ stepKey, folded }: { stepKey: LevelStepKey; folded: boolean }) {
  const guide = stepGuides[stepKey];
  const rows: [string, string][] = [
    ['Set up', guide.setUp],
    ['Look at', guide.lookAt],
    ['Level means', guide.levelMeans],
    ['If it is not', guide.adjust],
  ];
  return (
    <View style={styles.guide}>
      {folded
        ? null
        : rows.map(([title, body]) => (
            <View key={title} style={styles.guideRow}>
              <Text variant="label">{title}</Text>
              <Text>{body}</Text>
            </View>
          ))}
      {guide.caution ? <Banner tone="caution">{guide.caution}</Banner> : null}
    </View>
  );
}

/** A tap-wide row that shows or folds a part of the step (48 px or more tall). */
function FoldToggle({ open, label, onPress, testID }: { open: boolean; label: string; onPress: () => void; testID: string }) {
  return (
    <Pressable
      role="button"
      aria-expanded={open}
      onPress={onPress}
      style={({ pressed }) => [styles.toggle, pressed && styles.togglePressed]}
      testID={testID}
    >
      <Text variant="label" tone="signal">
        {open ? '▾' : '▸'} {label}
      </Text>
    </Pressable>
  );
}

export interface StepPanelProps {
  check: LevelCheck;
  stepKey: LevelStepKey;
  /** False for a completed check or someone else's: the step is shown read-only. */
  editable: boolean;
  /** Label of the main button, e.g. "Save and continue". */
  submitLabel: string;
  /** Complete the check with this save (the last step on a phone). */
  completes?: boolean;
  /** Called after a successful save with the saved check. */
  onSaved?: (check: LevelCheck) => void;
  /** Extra buttons beside the main one (e.g. "Back"). */
  secondary?: ReactNode;
  /** Lay the diagram beside the words (wide screens). */
  sideBySide?: boolean;
}

/**
 * One step of a level check: its diagram, what to set up and look at, what
 * level means and what to adjust, then the result buttons, an optional reading,
 * the adjustment note and a photo. Saves the step (and completes the check when
 * `completes`).
 *
 * On a phone (not `sideBySide`) the step is compact, for one hand at the
 * bench or the range: the diagram, then the result buttons and the save button
 * close under it; the how-to words and the reading, note and photo are each
 * folded behind a tap. The extras open by themselves when they hold something
 * saved, when "adjusted" asks what was adjusted, or when one of them has an
 * error to show; a step's own caution is never folded.
 * Example: `<StepPanel check={check} stepKey="second-axis" editable submitLabel="Save and continue" onSaved={next} />`
 */
export function StepPanel({
  check,
  stepKey,
  editable,
  submitLabel,
  completes = false,
  onSaved,
  secondary,
  sideBySide = false,
}: StepPanelProps) {
  const saved = check.steps.find((step) => step.step === stepKey);
  const guide = stepGuides[stepKey];
  const number = levelStepKeys.indexOf(stepKey) + 1;
  const save = useSaveCheck(check.id);
  const upload = useUploadStepPhoto(check.id);
  const removePhoto = useRemoveStepPhoto(check.id);
  const [general, setGeneral] = useState<string | null>(null);
  const [photoError, setPhotoError] = useState<string | null>(null);
  const { control, handleSubmit, formState } = useForm<StepText, unknown, StepEntry>({
    resolver: textFormResolver<StepText, StepEntry>(stepTextSchema),
    defaultValues: stepTextFrom(saved, stepKey),
  });
  const result = useWatch({ control, name: 'result' });
  const compact = !sideBySide;
  const [guideOpen, setGuideOpen] = useState(!compact);
  const hasExtras = !!saved && (saved.reading !== null || saved.adjustment !== '' || saved.photo !== null);
  const [extrasOpen, setExtrasOpen] = useState(!compact || hasExtras);
  const extrasNeeded =
    result === 'adjusted' || !!formState.errors.reading || !!formState.errors.readingUnit || !!formState.errors.adjustment || !!photoError;
  const showExtras = extrasOpen || extrasNeeded;
  const [reading, adjustment] = useWatch({ control, name: ['reading', 'adjustment'] });
  const extrasFilled = reading.trim() !== '' || adjustment.trim() !== '' || !!saved?.photo;

  const submit = handleSubmit((entry) => {
    setGeneral(null);
    save.mutate(
      { steps: [entry], ...(completes ? { complete: true as const } : {}) },
      {
        onSuccess: (updated) => onSaved?.(updated),
        onError: (error) => setGeneral(error.message),
      },
    );
  });

  const heading = (
    <View style={styles.heading}>
      <Text variant="caption" tone="soft">
        Step {number} of {levelStepKeys.length}
      </Text>
      <Text role="heading" aria-level={2} variant="title">
        {guide.title}
      </Text>
      <Text tone="soft">{guide.summary}</Text>
    </View>
  );

  const readOnly = !editable ? <SavedStep check={check} stepKey={stepKey} /> : null;

  const form = editable ? (
    <View style={styles.form}>
      <Controller
        control={control}
        name="result"
        render={({ field, fieldState }) => (
          <ResultButtons value={field.value} onChange={field.onChange} error={fieldState.error?.message} testID={stepKey} />
        )}
      />
      {compact ? (
        <FoldToggle
          open={showExtras}
          label={
            showExtras ? 'Reading, note and photo' : extrasFilled ? 'Reading, note and photo (filled in)' : 'Add a reading, note or photo'
          }
          onPress={() => setExtrasOpen(!showExtras)}
          testID={`${stepKey}-extras`}
        />
      ) : null}
      {showExtras ? (
        <>
          <View style={styles.readingRow}>
            <View style={styles.readingField}>
              <FormField
                control={control}
                name="reading"
                label="Reading (optional)"
                hint="Bubble or plumb offset, or degrees"
                numeric
                testID={`${stepKey}-reading`}
              />
            </View>
            <View style={styles.readingUnit}>
              <Controller
                control={control}
                name="readingUnit"
                render={({ field, fieldState }) => (
                  <SegmentedControl
                    size="large"
                    label="Unit"
                    options={unitOptions}
                    value={field.value}
                    onChange={field.onChange}
                    error={fieldState.error?.message}
                  />
                )}
              />
            </View>
          </View>
          <FormField
            control={control}
            name="adjustment"
            label={result === 'adjusted' ? 'What you adjusted' : 'Adjustment or note (optional)'}
            hint={result === 'adjusted' ? `E.g. “${guide.adjustExample}”` : undefined}
            multiline
            testID={`${stepKey}-adjustment`}
          />
          <PhotoPicker
            photo={saved?.photo ?? null}
            pending={upload.isPending || removePhoto.isPending}
            error={photoError}
            testID={`${stepKey}-photo`}
            onPick={(file, fileName) => {
              setPhotoError(null);
              upload.mutate({ step: stepKey, file, fileName }, { onError: (error) => setPhotoError(error.message) });
            }}
            onRemove={() => {
              setPhotoError(null);
              removePhoto.mutate(stepKey, { onError: (error) => setPhotoError(error.message) });
            }}
          />
        </>
      ) : null}
      {general ? (
        <Banner tone="error" title="Not saved">
          {general}
        </Banner>
      ) : null}
      <View style={styles.actions}>
        {secondary}
        <Button
          label={submitLabel}
          pendingLabel="Saving…"
          pending={save.isPending}
          onPress={submit}
          style={styles.primary}
          testID={`${stepKey}-save`}
        />
      </View>
      {formState.isDirty && !save.isPending ? (
        <Text variant="caption" tone="soft">
          Unsaved changes on this step.
        </Text>
      ) : null}
    </View>
  ) : null;

  return (
    <View style={styles.panel} testID={`step-${stepKey}`}>
      {heading}
      <View style={[styles.body, sideBySide && styles.bodySide]}>
        <View style={[styles.picture, sideBySide && styles.pictureSide]}>
          <LevelDiagram step={stepKey} />
        </View>
        <View style={[styles.words, sideBySide && styles.wordsSide]}>
          {compact ? (
            <FoldToggle
              open={guideOpen}
              label={guideOpen ? 'How to check this step' : 'How to check this step: set up, look at, adjust'}
              onPress={() => setGuideOpen(!guideOpen)}
              testID={`${stepKey}-how`}
            />
          ) : null}
          <Guidance stepKey={stepKey} folded={!guideOpen} />
        </View>
      </View>
      {readOnly}
      {form}
      {!editable && secondary ? <View style={styles.actions}>{secondary}</View> : null}
    </View>
  );
}

/** A saved step, read-only: result, reading, note and photo. */
export function SavedStep({ check, stepKey }: { check: LevelCheck; stepKey: LevelStepKey }) {
  const step = check.steps.find((s) => s.step === stepKey);
  if (!step || !step.result) {
    return (
      <Text tone="soft" testID={`${stepKey}-saved`}>
        No result recorded.
      </Text>
    );
  }
  const look = resultColors[step.result];
  const Icon = resultIcons[step.result];
  return (
    <View style={[styles.saved, { borderLeftColor: look.text }]} testID={`${stepKey}-saved`}>
      <View style={styles.savedResult}>
        <Icon size={24} color={look.text} />
        <Text variant="label" style={{ color: look.text }}>
          {resultLabels[step.result]}
        </Text>
        {step.reading !== null && step.readingUnit ? (
          <Text variant="numeral">
            {step.reading} {readingUnitLabels[step.readingUnit]}
          </Text>
        ) : null}
      </View>
      {step.adjustment ? <Text>{step.adjustment}</Text> : null}
      {step.photo ? (
        <Image
          source={{ uri: step.photo.url }}
          style={styles.savedImage}
          accessibilityLabel={`Photo of the ${stepGuides[stepKey].title.toLowerCase()}`}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.lg },
  heading: { gap: space.xxs },
  body: { gap: space.lg },
  bodySide: { flexDirection: 'row', alignItems: 'flex-start' },
  picture: { alignSelf: 'stretch' },
  pictureSide: { flexBasis: 360, flexShrink: 0, flexGrow: 0 },
  words: {},
  wordsSide: { flex: 1, minWidth: 0 },
  guide: { gap: space.md },
  toggle: { minHeight: 48, justifyContent: 'center', alignSelf: 'flex-start', paddingRight: space.md },
  togglePressed: { opacity: 0.6 },
  guideRow: { gap: space.xxs },
  form: { gap: space.lg, paddingTop: space.md, borderTopWidth: borders.hairline, borderTopColor: colors.line },
  readingRow: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  readingField: { flexGrow: 1, flexBasis: 160 },
  readingUnit: { flexGrow: 2, flexBasis: 260 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'center' },
  primary: { minHeight: bigTap, flexGrow: 1, alignSelf: 'stretch' },
  saved: { gap: space.sm, padding: space.md, borderLeftWidth: borders.heavy, backgroundColor: colors.surface, borderRadius: radii.md },
  savedResult: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  savedImage: { width: '100%', maxWidth: 320, aspectRatio: 4 / 3, borderRadius: radii.md },
});
