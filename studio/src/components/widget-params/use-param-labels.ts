import { isWidgetType, settingName, visitorSettingName } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useWidgetTypes } from '../../api/widgets';
import { widgetFormGroups } from './widget-form';

/**
 * "Slope angle (°)" for a param path: a setting visitors move is named as the kiosk names it, in
 * the studio's language; any other as the studio's widget form names it (shared `settingName`), then
 * by the widget's published JSON Schema; the path itself otherwise.
 * The unit comes from the schema.
 */
export function useParamLabels(): (widgetType: string, path: string[]) => string {
  const types = useWidgetTypes();
  const { i18n } = useTranslation();
  const language = i18n.resolvedLanguage ?? 'en';
  return (widgetType, path) => {
    const descriptor = types.data?.items.find((item) => item.type === widgetType);
    const field = descriptor ? widgetFormGroups(descriptor.jsonSchema).flatMap((group) => group.fields).find((f) => f.path.join('.') === path.join('.')) : undefined;
    const name = (path.length === 1 ? visitorSettingName(widgetType, path[0]!, language) : undefined) ?? settingName(widgetType, path, language) ?? field?.label;
    if (!name) return path.join(' › ');
    return field?.unit ? `${name} (${field.unit})` : name;
  };
}

/** A widget's name in the studio's language; a type this studio does not know shows as itself, so the problem stays visible. */
export function useWidgetName(): (widgetType: string) => string {
  const { t } = useTranslation();
  return (widgetType) => (isWidgetType(widgetType) ? t(`widgetTypes.${widgetType}`) : widgetType);
}
