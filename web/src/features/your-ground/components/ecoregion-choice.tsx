import { useTranslation } from 'react-i18next';
import { makeStyles, mergeClasses, Radio, RadioGroup, tokens } from '@fluentui/react-components';
import { useId } from 'react';

export interface EcoregionOption {
  code: string;
  name: string;
  description: string;
  /** Share of the county in this region, 0–1, when known. */
  share?: number | null;
}

/** The value for "not sure: use the whole state". */
export const WHOLE_STATE = '';

const useStyles = makeStyles({
  group: { display: 'grid', gap: tokens.spacingVerticalS },
  card: {
    border: `1px solid ${tokens.colorNeutralStroke1}`,
    borderRadius: tokens.borderRadiusXLarge,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalS}`,
    backgroundColor: tokens.colorNeutralBackground1,
  },
  checked: { border: `2px solid ${tokens.colorBrandStroke1}`, backgroundColor: tokens.colorBrandBackground2 },
  label: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXS },
  name: { fontWeight: tokens.fontWeightSemibold },
  description: {
    color: tokens.colorNeutralForeground2,
    fontSize: tokens.fontSizeBase200,
    lineHeight: tokens.lineHeightBase200,
  },
  question: { margin: `0 0 ${tokens.spacingVerticalS}`, fontWeight: tokens.fontWeightSemibold },
});

/** Radio cards: each ecoregion with its plain description, so people can recognise their own ground. */
export function EcoregionChoice({
  question,
  options,
  value,
  onChange,
  stateName,
}: {
  question: string;
  options: readonly EcoregionOption[];
  value: string;
  onChange: (code: string) => void;
  /** Adds a "not sure" card that uses the whole state. */
  stateName?: string;
}) {
  const styles = useStyles();
  const { t } = useTranslation('ground');
  const questionId = useId();
  const cards = stateName
    ? [
        ...options,
        {
          code: WHOLE_STATE,
          name: t('result.notSure'),
          description: t('result.notSureText', { state: stateName }),
        },
      ]
    : options;
  return (
    <div>
      <p id={questionId} className={styles.question}>
        {question}
      </p>
      <RadioGroup
        aria-labelledby={questionId}
        value={value}
        onChange={(_, d) => onChange(d.value)}
        className={styles.group}
      >
        {cards.map((o) => (
          <Radio
            key={o.code || 'whole-state'}
            value={o.code}
            className={mergeClasses(styles.card, value === o.code && styles.checked)}
            label={
              <span className={styles.label}>
                <span className={styles.name}>
                  {!o.code
                    ? o.name
                    : 'share' in o && typeof o.share === 'number'
                      ? t('result.optionShare', { name: o.name, code: o.code, share: Math.round(o.share * 100) })
                      : t('result.optionCode', { name: o.name, code: o.code })}
                </span>
                <span className={styles.description}>{o.description}</span>
              </span>
            }
          />
        ))}
      </RadioGroup>
    </div>
  );
}
