import { Button } from '@fluentui/react-components';
import { CalendarAddRegular } from '@fluentui/react-icons';
import { useState } from 'react';
import { downloadMyBatchesIcs } from '../../../api/batches/batches.api.js';
import { useTranslation } from 'react-i18next';

/** Downloads the grower's batch dates as an iCalendar file for their phone's calendar. */
export function CalendarDownload({ slug, year }: { slug: string; year: number }) {
  const { t } = useTranslation('batches');
  const [failure, setFailure] = useState<string | null>(null);
  const download = async () => {
    setFailure(null);
    try {
      // The file sits behind sign-in, so it is fetched with the token and handed over as a file.
      const blob = await downloadMyBatchesIcs(slug);
      const url = URL.createObjectURL(blob);
      const link = document.createElement('a');
      link.href = url;
      link.download = `homeground-my-batches-${year}.ics`;
      link.click();
      URL.revokeObjectURL(url);
    } catch (error) {
      setFailure(error instanceof Error ? error.message : t('page.calendarFailed'));
    }
  };
  return (
    <p>
      <Button size="large" icon={<CalendarAddRegular />} onClick={() => void download()}>
        {t('page.calendar')}
      </Button>
      {failure ? <span role="alert"> {failure}</span> : null}
    </p>
  );
}
