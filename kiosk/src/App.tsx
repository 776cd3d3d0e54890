import { useVenue } from './app/venue';
import { KioskScreens } from './screens/KioskScreens';
import { OfflineScreen } from './screens/OfflineScreen';

export function App() {
  const state = useVenue();
  if (state.status === 'loading') return <div className="blank" aria-busy="true" />;
  if (state.status === 'offline') return <OfflineScreen />;
  return <KioskScreens venue={state.venue} />;
}
