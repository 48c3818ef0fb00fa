// One weight per import: the package roots would bundle every weight of the family.
import { Fraunces_600SemiBold } from '@expo-google-fonts/fraunces/600SemiBold';
import { SourceSans3_400Regular } from '@expo-google-fonts/source-sans-3/400Regular';
import { SourceSans3_600SemiBold } from '@expo-google-fonts/source-sans-3/600SemiBold';

import { FONT_FAMILIES } from '@/modules/theme/core/palette';

export const FONT_ASSETS = {
  [FONT_FAMILIES.display]: Fraunces_600SemiBold,
  [FONT_FAMILIES.body]: SourceSans3_400Regular,
  [FONT_FAMILIES.bodyStrong]: SourceSans3_600SemiBold,
};
