import { isWidgetType } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useWidgetTypes } from '../../api/widgets';
import { widgetFormGroups } from './widget-form';

/** "Slope angle θ (°)" for a param path, read from the widget's published JSON Schema; the path itself otherwise. */
export function useParamLabels(): (widgetType: string, path: string[]) => string {
  const types = useWidgetTypes();
  return (widgetType, path) => {
    const descriptor = types.data?.items.find((item) => item.type === widgetType);
    const field = descriptor ? widgetFormGroups(descriptor.jsonSchema).flatMap((group) => group.fields).find((f) => f.path.join('.') === path.join('.')) : undefined;
    if (!field) return path.join(' › ');
    return field.unit ? `${field.label} (${field.unit})` : field.label;
  };
}

/** A widget's name in the studio's language; a type this studio does not know shows as itself, so the problem stays visible. */
export function useWidgetName(): (widgetType: string) => string {
  const { t } = useTranslation();
  return (widgetType) => (isWidgetType(widgetType) ? t(`widgetTypes.${widgetType}`) : widgetType);
}
