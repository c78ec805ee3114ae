import { MessageBar, MessageBarBody, MessageBarTitle } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';

/** Said instead of a comparison when the reference files are not where Homeground is configured to read them. */
export function ReferenceMissing({ files }: { files: string[] }) {
  const { t } = useTranslation('reference');
  return (
    <MessageBar intent="warning">
      <MessageBarBody>
        <MessageBarTitle>{t('missing.title')}</MessageBarTitle>
        {t('missing.text', { files: files.join(', ') })}
      </MessageBarBody>
    </MessageBar>
  );
}
