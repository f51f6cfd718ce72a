import { Banner } from '@/components/ui/banner';
import { Text } from '@/components/ui/text';
import { colors } from '@/components/theme';
import { paperTuneCautions } from '@/shared/paper-tune-rules';

/**
 * The cautions for tuning work: bow press, dry fire, the pro shop when unsure.
 * Example: `<TuningCautions />`
 */
export function TuningCautions() {
  return (
    <Banner tone="caution" testID="tuning-caution">
      {paperTuneCautions.map((line) => (
        <Text key={line} variant="small" style={{ color: colors.onCaution }}>
          {line}
        </Text>
      ))}
    </Banner>
  );
}
