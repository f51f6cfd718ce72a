import { Text } from '@/components/ui/text';
import type { AddedBy } from '@/shared/added-by';

/**
 * Who added a record, in words: "you", their name, or "a former account"
 * once that account is deleted. Undefined (an answer without the field) is ''.
 * Example: addedByWords({ id: 7, name: 'Desmond Tull' }, 3) → 'Desmond Tull'
 */
export function addedByWords(addedBy: AddedBy | undefined, meId?: number): string {
  if (addedBy === undefined) return '';
  if (addedBy === null) return 'a former account';
  return addedBy.id === meId ? 'you' : addedBy.name;
}

/**
 * " · added by Desmond Tull" for a list row, when someone other than the bow's
 * archer added it; '' for the archer's own records (most rows) and unknown ones.
 * Example: addedByNote(build.addedBy, bow) → ' · added by Desmond Tull'
 */
export function addedByNote(addedBy: AddedBy | undefined, bow: { userId: number }): string {
  if (addedBy === undefined || addedBy?.id === bow.userId) return '';
  return ` · added by ${addedByWords(addedBy)}`;
}

/**
 * One line: "Added by you" / "Added by Desmond Tull" / "Added by a former account".
 * Example: `<AddedByLine addedBy={build.addedBy} meId={me.id} />`
 */
export function AddedByLine({ addedBy, meId, testID }: { addedBy: AddedBy | undefined; meId?: number; testID?: string }) {
  if (addedBy === undefined) return null;
  return (
    <Text variant="small" tone="soft" testID={testID}>
      Added by {addedByWords(addedBy, meId)}
    </Text>
  );
}

type AttributedMark = { distance: number; unit: string; addedBy?: AddedBy };

/**
 * Who added a sight-in's marks, in one line grouped by person: "Marks added
 * by you: 20, 30, 40 yd · by Desmond Tull: 50 yd". Nothing when the answer
 * carries no attribution.
 * Example: `<MarkAuthors marks={sightIn.marks} meId={me.id} />`
 */
export function MarkAuthors({ marks, meId, sightInAddedBy }: { marks: AttributedMark[]; meId?: number; sightInAddedBy?: AddedBy }) {
  if (marks.length === 0 || marks.every((mark) => mark.addedBy === undefined)) return null;
  const groups = new Map<string, AttributedMark[]>();
  for (const mark of marks) {
    const who = addedByWords(mark.addedBy ?? null, meId);
    groups.set(who, [...(groups.get(who) ?? []), mark]);
  }
  const parts = [...groups].map(([who, group]) => `by ${who}: ${group.map((mark) => `${mark.distance}`).join(', ')} ${group[0].unit}`);
  const sightIn = sightInAddedBy === undefined ? '' : `Sight-in added by ${addedByWords(sightInAddedBy, meId)}. `;
  return (
    <Text variant="small" tone="soft" testID="mark-authors">
      {sightIn}Marks added {parts.join(' · ')}.
    </Text>
  );
}
