import { ComingSoon } from '@/components/ui/coming-soon';

/** Placeholder for the new-bow form (built later). */
export function NewBowScreen() {
  return (
    <ComingSoon
      title="Add a bow"
      message="The bow form is on its way: nickname, hand, draw weight and length, let-off, sight, sight radius and peep height."
    />
  );
}
