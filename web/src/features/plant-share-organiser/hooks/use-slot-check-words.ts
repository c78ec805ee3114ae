import { MAX_SLOTS } from '@homeground/shared';
import { useTranslation } from 'react-i18next';
import { useSchemaMessage } from '../../../lib/forms/schema-messages.js';
import type { SlotCheckWords } from '../utils/share-form.js';

/** The slot rows' own messages in the page's language, and the shared schema's said the same way. */
export function useSlotCheckWords(): SlotCheckWords {
  const { t } = useTranslation('organiser');
  const say = useSchemaMessage();
  return {
    none: t('slotCheck.none'),
    tooMany: t('slotCheck.tooMany', { count: MAX_SLOTS }),
    start: t('slotCheck.start'),
    end: t('slotCheck.end'),
    capacity: t('slotCheck.capacity'),
    say,
  };
}
