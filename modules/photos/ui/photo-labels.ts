import { AREA_LABELS } from '@/modules/assessment/core/grade';
import { PHOTO_AREAS, type PhotoArea } from '@/modules/photos/core/photo-rules';

export const PHOTO_AREA_LABELS: Record<PhotoArea, string> = { ...AREA_LABELS, case: 'Case', general: 'General' };
export { PHOTO_AREAS };
