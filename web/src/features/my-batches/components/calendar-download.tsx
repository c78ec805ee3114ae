import { Button } from '@fluentui/react-components';
import { CalendarAddRegular } from '@fluentui/react-icons';
import { useState } from 'react';
import { downloadMyBatchesIcs } from '../../../api/batches/batches.api.js';
import { MY_BATCHES_WORDS } from '../utils/my-batches-words.js';

/** Downloads the grower's batch dates as an iCalendar file for their phone's calendar. */
export function CalendarDownload({ slug, year }: { slug: string; year: number }) {
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
      setFailure(error instanceof Error ? error.message : MY_BATCHES_WORDS.calendarFailed);
    }
  };
  return (
    <p>
      <Button size="large" icon={<CalendarAddRegular />} onClick={() => void download()}>
        {MY_BATCHES_WORDS.calendar}
      </Button>
      {failure ? <span role="alert"> {failure}</span> : null}
    </p>
  );
}
