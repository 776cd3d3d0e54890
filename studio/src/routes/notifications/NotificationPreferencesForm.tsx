import { useState } from 'react';
import { Button, Checkbox, makeStyles, Spinner, Text, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { NOTIFICATION_KINDS, type NotificationPreferences } from '@mantlepiece/shared';
import { useNotificationPreferences, useUpdateNotificationPreferences } from '../../api/notifications';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError } from '../../components/forms/describe-error';
import { useReviewStyles } from '../../components/review/review-styles';

const useStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  fieldset: { border: 0, margin: 0, padding: 0, display: 'flex', flexDirection: 'column' },
  legend: { padding: 0, marginBottom: tokens.spacingVerticalXS },
});

/** Which kinds of notification also come by e-mail; the list in the studio keeps them all. */
export function NotificationPreferencesForm() {
  const { t } = useTranslation();
  const preferences = useNotificationPreferences();
  if (preferences.isPending) return <Spinner size="small" label={t('common.loading')} />;
  if (preferences.isError) return <FormAlert intent="error">{describeError(t, preferences.error)}</FormAlert>;
  return <PreferencesForm saved={preferences.data} />;
}

function PreferencesForm({ saved }: { saved: NotificationPreferences }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const shared = useReviewStyles();
  const update = useUpdateNotificationPreferences();
  const [values, setValues] = useState(saved);
  const dirty = NOTIFICATION_KINDS.some((kind) => values[kind]?.email !== saved[kind]?.email);
  return (
    <form className={styles.form} onSubmit={(event) => { event.preventDefault(); update.mutate(values); }}>
      <fieldset className={styles.fieldset}>
        <legend className={styles.legend}><Text weight="semibold">{t('notifications.emailLegend')}</Text></legend>
        {NOTIFICATION_KINDS.map((kind) => (
          <Checkbox
            key={kind}
            label={t(`notifications.kinds.${kind}`)}
            checked={values[kind]?.email ?? true}
            onChange={(_event, data) => setValues((current) => ({ ...current, [kind]: { email: data.checked === true } }))}
          />
        ))}
      </fieldset>
      <Text size={200} className={shared.muted}>{t('notifications.emailHint')}</Text>
      <div>
        <Button type="submit" appearance={dirty ? 'primary' : 'secondary'} disabled={!dirty || update.isPending}>
          {update.isPending ? t('common.saving') : t('notifications.savePreferences')}
        </Button>
      </div>
      {update.isError ? <FormAlert intent="error">{describeError(t, update.error)}</FormAlert> : null}
      {update.isSuccess && !dirty ? <FormAlert intent="success">{t('notifications.preferencesSaved')}</FormAlert> : null}
    </form>
  );
}
