import { useRouter } from 'expo-router';

import { BowLoader } from '@/components/bows/bow-loader';
import { OwnerOnlyNotice } from '@/components/bows/owner-only-notice';
import { BuildForm } from '@/components/builds/build-form';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';

/** Add an arrow build to a bow; on save, back to the bow. */
export function NewBuildScreen({ bowId }: { bowId: number }) {
  const router = useRouter();
  return (
    <BowLoader bowId={bowId} title="Add a build">
      {({ me, bow, role: { isOwner, canAdd } }) => {
        if (!canAdd) {
          return (
            <Screen>
              <ScreenTitle name="Add a build" />
              <OwnerOnlyNotice bow={bow} what="add arrow builds to this bow" />
            </Screen>
          );
        }
        const back = () => router.replace(`/bows/${bowId}`);
        return (
          <Screen>
            <ScreenTitle name="Add a build" />
            <SectionHeading
              level={1}
              title="Add an arrow build"
              description={
                isOwner
                  ? `For ${bow.nickname}. The fit uses the arrow's weight and diameter.`
                  : `For ${bow.ownerName || 'the archer'}’s ${bow.nickname}. It is added as a new build, shown to them as added by you; their own builds stay as they are.`
              }
            />
            <BuildForm bowId={bowId} lengthUnit={me.lengthUnit} onSaved={back} onCancel={back} />
          </Screen>
        );
      }}
    </BowLoader>
  );
}
