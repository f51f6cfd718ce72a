import { useRouter } from 'expo-router';

import { useMe } from '@/components/auth/api';
import { BowForm } from '@/components/bows/bow-form';
import { LoadingView } from '@/components/ui/loading-view';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';

/** Add a bow: its set-up in the archer's units; on save, open the new bow. */
export function NewBowScreen() {
  const router = useRouter();
  const me = useMe();
  if (!me.data) return <LoadingView />;
  return (
    <Screen>
      <ScreenTitle name="Add a bow" />
      <SectionHeading
        level={1}
        title="Add a bow"
        description="The measurements the fit needs: sight radius and peep height. Everything else helps you and your technician."
      />
      <BowForm
        lengthUnit={me.data.lengthUnit}
        distanceUnit={me.data.distanceUnit}
        onSaved={(bow) => router.replace(`/bows/${bow.id}`)}
        onCancel={() => (router.canGoBack() ? router.back() : router.replace('/'))}
      />
    </Screen>
  );
}
