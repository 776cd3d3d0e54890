import { widgetStrings } from '../i18n/index.js';

/** The brief's caution, shown wherever a curator sets a simulation's parameters. */
export function SimulationCaution({ locale }: { locale: string }) {
  return (
    <p className="mp-widget-caution" role="note" style={{ margin: '0.5em 0', fontSize: '0.9em' }}>
      {widgetStrings(locale).caution}
    </p>
  );
}
