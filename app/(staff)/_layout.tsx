import { Slot } from 'expo-router';

import { StaffArea } from '@/modules/accounts/ui/staff-shell';

export default function StaffLayout() {
  return (
    <StaffArea>
      <Slot />
    </StaffArea>
  );
}
