import { useTranslation } from 'react-i18next';
import { Button, Checkbox } from '@fluentui/react-components';
import { ArrowLeft20Regular, ArrowRight20Regular } from '@fluentui/react-icons';
import type { Goal, SiteRequest } from '@homeground/shared';
import { useEffect, useId, useRef, useState, type FormEvent } from 'react';
import { useFormatters } from '../../../../lib/i18n/index.js';
import type { AreaUnit } from '../../utils/mix-plan.js';
import { ChoiceField } from './choice-field.js';
import { MeasureField } from './measure-field.js';
import {
  DEER_CHOICES,
  GOAL_CHOICES,
  MOISTURE_CHOICES,
  SOIL_CHOICES,
  SUN_CHOICES,
  type Choice,
} from '../../utils/yard-form-choices.js';
import {
  checkYard,
  type HeightUnit,
  otherAreaUnit,
  otherHeightUnit,
  type YardErrors,
  type YardField,
  type YardFormValues,
} from '../../utils/yard-form-values.js';
import { useYardFormStyles } from './yard-form.styles.js';

const AREA_UNITS = [
  { value: 'ft2', label: 'ft²', spoken: 'square feet' },
  { value: 'm2', label: 'm²', spoken: 'square metres' },
] as const;
const HEIGHT_UNITS = [
  { value: 'ft', label: 'ft', spoken: 'feet' },
  { value: 'cm', label: 'cm', spoken: 'centimetres' },
] as const;

export interface YardFormProps {
  initial: YardFormValues;
  onSubmit: (site: SiteRequest, areaUnit: AreaUnit) => void;
  onBack?: () => void;
}

/** Step 2: the questions about the spot, checked before anything is sent, with messages beside each field. */
export function YardForm({ initial, onSubmit, onBack }: YardFormProps) {
  const styles = useYardFormStyles();
  const { t } = useTranslation('yard');
  const f = useFormatters();
  /** A choice list with its words in the page's language (the English in yard-form-choices.ts is the default). */
  const say = <V extends string>(group: 'sun' | 'moisture' | 'soil' | 'deer' | 'goal', list: readonly Choice<V>[]) =>
    list.map((c) => {
      const key = `choices.${group}.${c.value || 'none'}` as 'choices.sun.full';
      return {
        ...c,
        label: t(`${key}.label`, { defaultValue: c.label }),
        line: t(`${key}.line`, { defaultValue: c.line }),
      };
    });
  const formRef = useRef<HTMLFormElement>(null);
  const [values, setValues] = useState<YardFormValues>(initial);
  const [errors, setErrors] = useState<YardErrors>({});
  const [attempt, setAttempt] = useState(0);
  const goalsLabelId = useId();

  // After a rejected submit, focus lands on the first question with a problem.
  useEffect(() => {
    if (attempt === 0) return;
    const invalid = formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]');
    const target =
      invalid && invalid.matches('input, select, textarea') ? invalid : invalid?.querySelector<HTMLElement>('input');
    target?.focus();
  }, [attempt]);

  const set = <K extends keyof YardFormValues>(key: K, value: YardFormValues[K], field?: YardField) => {
    setValues((v) => ({ ...v, [key]: value }));
    if (field) setErrors((e) => ({ ...e, [field]: undefined }));
  };

  const toggleGoal = (goal: Goal, on: boolean) =>
    set('goals', on ? [...values.goals, goal] : values.goals.filter((g) => g !== goal), 'goals');

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const check = checkYard(values, { t, f });
    if (!check.ok) {
      setErrors(check.errors);
      setAttempt((n) => n + 1);
      return;
    }
    setErrors({});
    onSubmit(check.site, check.areaUnit);
  };

  return (
    <form ref={formRef} className={styles.form} onSubmit={submit} noValidate aria-label={t('form.label')}>
      <fieldset className={styles.group}>
        <legend className={styles.legend}>{t('form.lightSoil')}</legend>
        <ChoiceField
          name="sun"
          label={t('form.sun')}
          required
          choices={say('sun', SUN_CHOICES)}
          value={values.sun}
          onChange={(v) => set('sun', v, 'sun')}
          error={errors.sun}
        />
        <ChoiceField
          name="moisture"
          label={t('form.moisture')}
          required
          choices={say('moisture', MOISTURE_CHOICES)}
          value={values.moisture}
          onChange={(v) => set('moisture', v, 'moisture')}
          error={errors.moisture}
        />
        <ChoiceField
          name="soilTexture"
          label={t('form.soil')}
          choices={say('soil', SOIL_CHOICES)}
          value={values.soilTexture}
          onChange={(v) => set('soilTexture', v, 'soilTexture')}
          error={errors.soilTexture}
        />
      </fieldset>

      <fieldset className={styles.group}>
        <legend className={styles.legend}>{t('form.size')}</legend>
        <MeasureField<AreaUnit>
          name="area"
          label={t('form.area')}
          required
          hint={t('form.areaHint')}
          value={values.area}
          onChange={(v) => set('area', v, 'area')}
          unit={values.areaUnit}
          units={AREA_UNITS}
          onUnitChange={(u) => set('areaUnit', u, 'area')}
          other={otherAreaUnit(values, { t, f })}
          error={errors.area}
        />
        <MeasureField<HeightUnit>
          name="maxHeight"
          label={t('form.maxHeight')}
          hint={t('form.maxHeightHint')}
          value={values.maxHeight}
          onChange={(v) => set('maxHeight', v, 'maxHeight')}
          unit={values.heightUnit}
          units={HEIGHT_UNITS}
          onUnitChange={(u) => set('heightUnit', u, 'maxHeight')}
          other={otherHeightUnit(values, { t, f })}
          error={errors.maxHeight}
        />
      </fieldset>

      <fieldset className={styles.group}>
        <legend className={styles.legend}>{t('form.deerGoals')}</legend>
        <ChoiceField
          name="deerPressure"
          label={t('form.deer')}
          required
          choices={say('deer', DEER_CHOICES)}
          value={values.deerPressure}
          onChange={(v) => set('deerPressure', v, 'deerPressure')}
          error={errors.deerPressure}
        />
        <div role="group" aria-labelledby={goalsLabelId}>
          <p id={goalsLabelId} className={styles.groupLabel}>
            {t('form.goals')}
          </p>
          <div className={styles.goals}>
            {say('goal', GOAL_CHOICES).map((g) => (
              <Checkbox
                key={g.value}
                className={styles.goal}
                indicator={{ className: styles.goalIndicator }}
                name="goals"
                value={g.value}
                checked={values.goals.includes(g.value)}
                onChange={(_, d) => toggleGoal(g.value, d.checked === true)}
                label={
                  <span>
                    <span className={styles.goalName}>{g.label}</span>
                    <span className={styles.goalLine}>{g.line}</span>
                  </span>
                }
              />
            ))}
          </div>
        </div>
        <Checkbox
          name="woodyPlants"
          checked={values.woodyPlants}
          onChange={(_, d) => set('woodyPlants', d.checked === true)}
          label={t('form.woody')}
        />
        <Checkbox
          name="spreaders"
          checked={values.spreaders}
          onChange={(_, d) => set('spreaders', d.checked === true)}
          label={t('form.spreaders')}
        />
      </fieldset>

      <div className={styles.actions}>
        <Button type="submit" appearance="primary" size="large" icon={<ArrowRight20Regular />} iconPosition="after">
          {t('form.submit')}
        </Button>
        {onBack ? (
          <Button type="button" appearance="subtle" icon={<ArrowLeft20Regular />} onClick={onBack}>
            {t('form.back')}
          </Button>
        ) : null}
      </div>
    </form>
  );
}
