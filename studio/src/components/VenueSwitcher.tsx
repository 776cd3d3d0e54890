import { Button, Menu, MenuItemRadio, MenuList, MenuPopover, MenuTrigger, type MenuProps } from '@fluentui/react-components';
import { BuildingRegular } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import { useCurrentVenue } from '../app/current-venue';

/** Chooses the venue the studio shows, for a person who works at more than one; nothing for everyone else. */
export function VenueSwitcher({ className }: { className?: string }) {
  const { t } = useTranslation();
  const { venues, venue, choose } = useCurrentVenue();
  if (venues.length < 2 || !venue) return null;

  const pick: MenuProps['onCheckedValueChange'] = (_event, { checkedItems }) => {
    const id = Number(checkedItems[0]);
    if (id && id !== venue.id) choose(id);
  };

  return (
    <Menu checkedValues={{ venue: [String(venue.id)] }} onCheckedValueChange={pick}>
      <MenuTrigger disableButtonEnhancement>
        <Button appearance="subtle" icon={<BuildingRegular />} className={className} aria-label={t('venueSwitcher.current', { venue: venue.name })}>
          {venue.name}
        </Button>
      </MenuTrigger>
      <MenuPopover>
        <MenuList aria-label={t('venueSwitcher.menu')}>
          {venues.map((candidate) => (
            <MenuItemRadio key={candidate.id} name="venue" value={String(candidate.id)}>
              {candidate.name}
            </MenuItemRadio>
          ))}
        </MenuList>
      </MenuPopover>
    </Menu>
  );
}
