import { makeStyles, ToggleButton, tokens } from '@fluentui/react-components';
import type { ReactElement, ReactNode } from 'react';

const useStyles = makeStyles({
  group: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalS },
});

export interface ViewSwitchOption<T extends string> {
  value: T;
  label: ReactNode;
  icon?: ReactElement;
}

/**
 * Two or more ways to show the same content, as pressed/unpressed buttons in a named group. Used
 * instead of Fluent's TabList: its arrow-key focus manager adds aria-hidden focusable sentinels
 * (axe-core `aria-hidden-focus`, WCAG 4.1.2), and a plain group of buttons needs no such trick.
 */
export function ViewSwitch<T extends string>({
  label,
  options,
  value,
  onChange,
}: {
  /** The group's accessible name ("What to print"). */
  label: string;
  options: readonly ViewSwitchOption<T>[];
  value: T;
  onChange: (value: T) => void;
}) {
  const styles = useStyles();
  return (
    <div role="group" aria-label={label} className={styles.group}>
      {options.map((o) => (
        <ToggleButton key={o.value} checked={o.value === value} icon={o.icon} onClick={() => onChange(o.value)}>
          {o.label}
        </ToggleButton>
      ))}
    </div>
  );
}
