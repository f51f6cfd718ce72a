import type { Href } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';

import { ChevronRightIcon } from '@/components/ui/icons';
import { LinkPressable, type PressState } from '@/components/ui/link-pressable';
import { Text } from '@/components/ui/text';
import { borders, colors, layout, radii, space } from '@/components/theme';

export interface RecordRowProps {
  title: string;
  /** One line under the title (e.g. "412 gr · FOC 11.8 %"). */
  detail?: string;
  /** A short value on the right (e.g. a date). */
  aside?: string;
  /** Link mode (phone): the row opens this route. */
  href?: Href;
  /** Select mode (wide screen): the row selects a record for the detail pane. */
  onSelect?: () => void;
  selected?: boolean;
  testID?: string;
}

/**
 * One record in a bow's lists: a link on a phone, or a selectable row whose
 * detail shows beside the list on a wide screen (the selected row is marked
 * with an edge and aria-pressed, not colour alone).
 * Example: `<RecordRow title="Elk heavy" detail="498 gr" href="/builds/4" />`
 */
export function RecordRow({ title, detail, aside, href, onSelect, selected = false, testID }: RecordRowProps) {
  const body = ({ pressed, hovered, focused }: PressState) => [
    styles.row,
    (pressed || hovered) && styles.hovered,
    selected && styles.selected,
    focused && styles.focused,
  ];
  const content = (
    <>
      <View style={[styles.edge, selected && styles.edgeSelected]} />
      <View style={styles.words}>
        <Text variant="label" numberOfLines={1}>
          {title}
        </Text>
        {detail ? (
          <Text variant="small" tone="soft">
            {detail}
          </Text>
        ) : null}
      </View>
      {aside ? (
        <Text variant="small" tone="soft" style={styles.aside}>
          {aside}
        </Text>
      ) : null}
      <ChevronRightIcon size={22} color={colors.inkSoft} />
    </>
  );
  if (href) {
    return (
      <LinkPressable href={href} testID={testID} style={body}>
        {content}
      </LinkPressable>
    );
  }
  return (
    <Pressable role="button" aria-pressed={selected} testID={testID} onPress={onSelect} style={body}>
      {content}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    minHeight: layout.minTap + 8,
    paddingRight: space.md,
    paddingVertical: space.sm,
    borderRadius: radii.md,
    backgroundColor: colors.surface,
    borderWidth: borders.hairline,
    borderColor: colors.line,
    overflow: 'hidden',
  },
  hovered: { borderColor: colors.lineStrong },
  selected: { backgroundColor: colors.signalTint, borderColor: colors.signal },
  focused: { outlineColor: colors.focus, outlineStyle: 'solid', outlineWidth: borders.focus, outlineOffset: 2 },
  edge: { width: borders.heavy, alignSelf: 'stretch', backgroundColor: 'transparent' },
  edgeSelected: { backgroundColor: colors.signal },
  words: { flex: 1, minWidth: 0, gap: space.xxs },
  aside: { flexShrink: 0 },
});
