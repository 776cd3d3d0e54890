import { Button, Menu, MenuDivider, MenuGroupHeader, MenuItem, MenuList, MenuPopover, MenuTrigger } from '@fluentui/react-components';
import { PersonCircleRegular, SignOutRegular } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import { useNavigate } from 'react-router-dom';
import { useCurrentUser, useSignOut } from '../api/session';

export function AccountMenu({ className }: { className?: string }) {
  const { t } = useTranslation();
  const user = useCurrentUser();
  const signOut = useSignOut();
  const navigate = useNavigate();

  return (
    <Menu>
      <MenuTrigger disableButtonEnhancement>
        <Button appearance="subtle" icon={<PersonCircleRegular />} className={className} aria-label={`${t('account.menu')}: ${user.name}`}>
          {user.name}
        </Button>
      </MenuTrigger>
      <MenuPopover>
        <MenuList>
          <MenuGroupHeader>{t('account.signedInAs', { email: user.email })}</MenuGroupHeader>
          <MenuDivider />
          <MenuItem
            icon={<SignOutRegular />}
            onClick={() => signOut.mutate(undefined, { onSettled: () => void navigate('/sign-in', { replace: true }) })}
          >
            {t('account.signOut')}
          </MenuItem>
        </MenuList>
      </MenuPopover>
    </Menu>
  );
}
