import { useTranslation } from 'react-i18next';
import { Menu, MenuButton, MenuItemCheckbox, MenuList, MenuPopover, MenuTrigger } from '@fluentui/react-components';
import { TableSettings20Regular } from '@fluentui/react-icons';
import { OPTIONAL_COLUMNS, type OptionalColumn } from '../hooks/use-column-choice.js';

/** Show or hide table columns; the choice is remembered on this device. */
export function ColumnMenu({
  shown,
  onChange,
}: {
  shown: readonly OptionalColumn[];
  onChange: (shown: OptionalColumn[]) => void;
}) {
  const { t } = useTranslation('species');
  return (
    <Menu
      checkedValues={{ columns: [...shown] }}
      onCheckedValueChange={(_, data) => onChange(OPTIONAL_COLUMNS.filter((c) => data.checkedItems.includes(c)))}
    >
      <MenuTrigger disableButtonEnhancement>
        <MenuButton icon={<TableSettings20Regular />}>{t('columns.menu')}</MenuButton>
      </MenuTrigger>
      <MenuPopover>
        <MenuList>
          {OPTIONAL_COLUMNS.map((c) => (
            <MenuItemCheckbox key={c} name="columns" value={c}>
              {t(`columns.${c}`)}
            </MenuItemCheckbox>
          ))}
        </MenuList>
      </MenuPopover>
    </Menu>
  );
}
