import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';

export interface ComingSoonProps {
  title: string;
  message: string;
  backHref?: '/' | '/sign-in';
  backLabel?: string;
}

/**
 * A placeholder page for a screen that is not built yet.
 * Example: `<ComingSoon title="Add a bow" message="…" />`
 */
export function ComingSoon({ title, message, backHref = '/', backLabel = 'Back to the bench' }: ComingSoonProps) {
  return (
    <Screen>
      <ScreenTitle name={title} />
      <SectionHeading level={1} title={title} />
      <Banner tone="info" title="Coming soon">
        {message}
      </Banner>
      <Button label={backLabel} variant="secondary" href={backHref} />
    </Screen>
  );
}
