import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import type { BowDetail } from '@/shared/bow-detail';

export interface OwnerOnlyNoticeProps {
  bow: Pick<BowDetail, 'id' | 'ownerName'>;
  /** What only the owner may do, as it follows "Only <name> can", e.g. "change this bow's set-up". */
  what: string;
}

/**
 * Shown instead of a form that only the bow's owner may use (reached by its
 * address by a technician the bow is shared with), with the way back.
 * Example: `<OwnerOnlyNotice bow={bow} what="add arrow builds to this bow" />`
 */
export function OwnerOnlyNotice({ bow, what }: OwnerOnlyNoticeProps) {
  const archer = bow.ownerName || 'the archer';
  return (
    <EmptyState
      testID="owner-only"
      title="This is the archer’s to change"
      message={`The bow is shared with you. Only ${archer} can ${what}; you can add sight-ins, marks, level checks and notes.`}
      action={<Button label="Back to the bow" href={`/bows/${bow.id}`} />}
    />
  );
}
