import { useWindowDimensions } from 'react-native';

import { LAYOUT } from '@/modules/theme/core/palette';

/** True from the width where the side navigation and tables take over from the phone layout. */
export function useWide(): boolean {
  return useWindowDimensions().width >= LAYOUT.wideFrom;
}
