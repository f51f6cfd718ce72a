import { useWindowDimensions } from 'react-native';

import { layout } from '@/components/theme';

/**
 * True when the window is wide enough for side-by-side layouts and the left rail
 * (theme.layout.wideFrom, 960 px).
 * Example: `const wide = useWide(); <View style={{ flexDirection: wide ? 'row' : 'column' }} />`
 */
export function useWide(): boolean {
  return useWindowDimensions().width >= layout.wideFrom;
}
