import { Banner } from '@/components/ui/banner';

/**
 * The safety caution for work on a bow: shown on the guided check and beside
 * the change log (a new string or cables means a bow press).
 * Example: `<LevelCaution />`
 */
export function LevelCaution() {
  return (
    <Banner tone="caution" testID="level-caution">
      A bow under load and a bow press can injure. Follow the maker&apos;s instructions for the bow, the sight and the press, wear eye
      protection, never dry-fire, and leave to a pro shop whatever you are unsure of.
    </Banner>
  );
}
