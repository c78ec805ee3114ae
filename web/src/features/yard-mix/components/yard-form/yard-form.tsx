import { Button, Checkbox } from '@fluentui/react-components';
import { ArrowLeft20Regular, ArrowRight20Regular } from '@fluentui/react-icons';
import type { Goal, SiteRequest } from '@homeground/shared';
import { useEffect, useId, useRef, useState, type FormEvent } from 'react';
import type { AreaUnit } from '../../utils/mix-plan.js';
import { ChoiceField } from './choice-field.js';
import { MeasureField } from './measure-field.js';
import {
  DEER_CHOICES,
  GOAL_CHOICES,
  MOISTURE_CHOICES,
  SOIL_CHOICES,
  SUN_CHOICES,
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
    const check = checkYard(values);
    if (!check.ok) {
      setErrors(check.errors);
      setAttempt((n) => n + 1);
      return;
    }
    setErrors({});
    onSubmit(check.site, check.areaUnit);
  };

  return (
    <form ref={formRef} className={styles.form} onSubmit={submit} noValidate aria-label="Your yard">
      <fieldset className={styles.group}>
        <legend className={styles.legend}>Light and soil</legend>
        <ChoiceField
          name="sun"
          label="How much sun does the spot get?"
          required
          choices={SUN_CHOICES}
          value={values.sun}
          onChange={(v) => set('sun', v, 'sun')}
          error={errors.sun}
        />
        <ChoiceField
          name="moisture"
          label="How wet does the soil stay?"
          required
          choices={MOISTURE_CHOICES}
          value={values.moisture}
          onChange={(v) => set('moisture', v, 'moisture')}
          error={errors.moisture}
        />
        <ChoiceField
          name="soilTexture"
          label="What is the soil like? (optional)"
          choices={SOIL_CHOICES}
          value={values.soilTexture}
          onChange={(v) => set('soilTexture', v, 'soilTexture')}
          error={errors.soilTexture}
        />
      </fieldset>

      <fieldset className={styles.group}>
        <legend className={styles.legend}>Size</legend>
        <MeasureField<AreaUnit>
          name="area"
          label="Area to plant"
          required
          hint="Length times width of the bed."
          value={values.area}
          onChange={(v) => set('area', v, 'area')}
          unit={values.areaUnit}
          units={AREA_UNITS}
          onUnitChange={(u) => set('areaUnit', u, 'area')}
          other={otherAreaUnit(values)}
          error={errors.area}
        />
        <MeasureField<HeightUnit>
          name="maxHeight"
          label="Tallest plant you want (optional)"
          hint="For under a window or beside a path; leave empty for any height."
          value={values.maxHeight}
          onChange={(v) => set('maxHeight', v, 'maxHeight')}
          unit={values.heightUnit}
          units={HEIGHT_UNITS}
          onUnitChange={(u) => set('heightUnit', u, 'maxHeight')}
          other={otherHeightUnit(values)}
          error={errors.maxHeight}
        />
      </fieldset>

      <fieldset className={styles.group}>
        <legend className={styles.legend}>Deer and goals</legend>
        <ChoiceField
          name="deerPressure"
          label="How often do deer visit?"
          required
          choices={DEER_CHOICES}
          value={values.deerPressure}
          onChange={(v) => set('deerPressure', v, 'deerPressure')}
          error={errors.deerPressure}
        />
        <div role="group" aria-labelledby={goalsLabelId}>
          <p id={goalsLabelId} className={styles.groupLabel}>
            What should the planting do? (choose any)
          </p>
          <div className={styles.goals}>
            {GOAL_CHOICES.map((g) => (
              <Checkbox
                key={g.value}
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
          label="Add shrubs and small trees (only those that fit your bed, in a share of it)"
        />
        <Checkbox
          name="spreaders"
          checked={values.spreaders}
          onChange={(_, d) => set('spreaders', d.checked === true)}
          label="Include plants that spread or seed themselves about (left out of beds under 500 ft² / 46 m² otherwise)"
        />
      </fieldset>

      <div className={styles.actions}>
        <Button type="submit" appearance="primary" size="large" icon={<ArrowRight20Regular />} iconPosition="after">
          Show my yard mix
        </Button>
        {onBack ? (
          <Button type="button" appearance="subtle" icon={<ArrowLeft20Regular />} onClick={onBack}>
            Back to your ground
          </Button>
        ) : null}
      </div>
    </form>
  );
}
