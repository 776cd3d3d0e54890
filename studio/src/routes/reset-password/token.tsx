import { useState, type FormEvent } from 'react';
import { Button, Text } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { useParams } from 'react-router-dom';
import { useCompletePasswordReset } from '../../api/password-reset';
import { usePageTitle } from '../../app/page-title';
import { FormAlert } from '../../components/forms/FormAlert';
import { NewPasswordFields, type NewPassword } from '../../components/forms/NewPasswordFields';
import { describeError, serverFieldMessage } from '../../components/forms/describe-error';
import { useFormStyles } from '../../components/forms/styles';
import { hasProblems, MIN_PASSWORD_LENGTH, newPasswordProblems } from '../../components/forms/validation';
import { LinkButton, TextLink } from '../../components/links';

export function CompletePasswordResetPage() {
  const { t } = useTranslation();
  const styles = useFormStyles();
  const { token = '' } = useParams();
  const complete = useCompletePasswordReset();
  const [value, setValue] = useState<NewPassword>({ password: '', confirm: '' });
  const [problems, setProblems] = useState<Partial<Record<keyof NewPassword, string>>>({});
  usePageTitle(t('resetPassword.completeTitle'));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = newPasswordProblems(t, value.password, value.confirm);
    setProblems(found);
    if (!hasProblems(found)) complete.mutate({ token, password: value.password });
  };

  const heading = <Text as="h1" size={700} weight="semibold" className={styles.heading}>{t('resetPassword.completeTitle')}</Text>;

  if (complete.isSuccess) {
    return (
      <div className={styles.form}>
        {heading}
        <FormAlert intent="success">{t('resetPassword.completed')}</FormAlert>
        <div className={styles.actions}>
          <LinkButton to="/sign-in" appearance="primary">{t('signIn.submit')}</LinkButton>
        </div>
      </div>
    );
  }

  const error = complete.error;
  const passwordMessage = serverFieldMessage(error, 'password');
  const gone = error !== null && !passwordMessage;
  return (
    <form className={styles.form} onSubmit={submit} noValidate>
      {heading}
      {gone ? <FormAlert intent="error">{describeError(t, error, { 410: t('resetPassword.goneBody'), 404: t('resetPassword.goneBody') })}</FormAlert> : null}
      <NewPasswordFields
        value={value}
        onChange={setValue}
        labels={{ password: t('resetPassword.password'), hint: t('resetPassword.passwordHint', { min: MIN_PASSWORD_LENGTH }), confirm: t('resetPassword.confirm') }}
        problems={{ password: problems.password ?? passwordMessage, confirm: problems.confirm }}
      />
      <div className={styles.actions}>
        <Button type="submit" appearance="primary" disabled={complete.isPending}>
          {complete.isPending ? t('resetPassword.completeSubmitting') : t('resetPassword.completeSubmit')}
        </Button>
        {gone ? <TextLink to="/reset-password">{t('resetPassword.requestAgain')}</TextLink> : <TextLink to="/sign-in">{t('resetPassword.backToSignIn')}</TextLink>}
      </div>
    </form>
  );
}
