import { Trans, useTranslation } from 'react-i18next';
import { Button, makeStyles, tokens } from '@fluentui/react-components';
import type { SiteRequest } from '@homeground/shared';
import { ContentCard } from '../../../../components/page/content-card.js';
import { Heading } from '../../../../components/page/page-heading.js';
import type { AreaUnit, MixRegion } from '../../utils/mix-plan.js';
import { usePlaceWords } from '../result/mix-summary.js';
import { YardForm } from './yard-form.js';
import type { YardFormValues } from '../../utils/yard-form-values.js';

const useStyles = makeStyles({
  ground: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
    margin: `0 0 ${tokens.spacingVerticalXL}`,
  },
  groundText: { margin: 0 },
});

/** Step 2: the yard questions, under a line that says which ground they are for. */
export function YardStep({
  region,
  initial,
  onSubmit,
  onChangeGround,
}: {
  region: MixRegion;
  initial: YardFormValues;
  onSubmit: (site: SiteRequest, areaUnit: AreaUnit) => void;
  onChangeGround: () => void;
}) {
  const styles = useStyles();
  const { t } = useTranslation('yard');
  const place = usePlaceWords(region.state, region.ecoregionCode);
  return (
    <ContentCard aria-labelledby="yard-heading">
      <Heading level="section" id="yard-heading">
        {t('step.heading')}
      </Heading>
      <div className={styles.ground}>
        <p className={styles.groundText}>
          <Trans
            t={t}
            i18nKey="step.yourGround"
            values={{ place: place.replace(/^the /, '') }}
            components={{ strong: <strong /> }}
          />
        </p>
        <Button appearance="transparent" size="small" onClick={onChangeGround}>
          {t('step.change')}
        </Button>
      </div>
      <YardForm initial={initial} onSubmit={onSubmit} onBack={onChangeGround} />
    </ContentCard>
  );
}
