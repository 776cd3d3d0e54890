import { Button, Menu, MenuItemRadio, MenuList, MenuPopover, MenuTrigger, type MenuProps } from '@fluentui/react-components';
import { GlobeRegular } from '@fluentui/react-icons';
import { asUiLanguage, UI_LANGUAGES } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useSession, useUpdateMe } from '../api/session';

/** Switches the studio's language; a signed-in person's choice is also saved to their account. */
export function LanguageMenu({ appearance = 'subtle', className }: { appearance?: 'subtle' | 'transparent'; className?: string }) {
  const { t, i18n } = useTranslation();
  const { data: session } = useSession();
  const updateMe = useUpdateMe();
  const current = asUiLanguage(i18n.resolvedLanguage);
  const currentName = UI_LANGUAGES.find((language) => language.code === current)?.name ?? current;

  const choose: MenuProps['onCheckedValueChange'] = (_event, { checkedItems }) => {
    const language = checkedItems[0];
    if (!language || language === current) return;
    void i18n.changeLanguage(language);
    if (session) updateMe.mutate({ uiLanguage: asUiLanguage(language) });
  };

  return (
    <Menu checkedValues={{ language: [current] }} onCheckedValueChange={choose}>
      <MenuTrigger disableButtonEnhancement>
        <Button appearance={appearance} icon={<GlobeRegular />} className={className} aria-label={t('language.current', { language: currentName })}>
          {currentName}
        </Button>
      </MenuTrigger>
      <MenuPopover>
        <MenuList>
          {UI_LANGUAGES.map((language) => (
            <MenuItemRadio key={language.code} name="language" value={language.code} lang={language.code}>
              {language.name}
            </MenuItemRadio>
          ))}
        </MenuList>
      </MenuPopover>
    </Menu>
  );
}
