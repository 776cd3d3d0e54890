import { useState, type FormEvent } from 'react';
import { Button, Field, Input, Text } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { useRequestPasswordReset } from '../../api/password-reset';
import { usePageTitle } from '../../app/page-title';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError, serverFieldMessage } from '../../components/forms/describe-error';
import { useFormStyles } from '../../components/forms/styles';
import { emailProblem } from '../../components/forms/validation';
import { TextLink } from '../../components/links';

export function RequestPasswordResetPage() {
  const { t } = useTranslation();
  const styles = useFormStyles();
  const request = useRequestPasswordReset();
  const [email, setEmail] = useState('');
  const [problem, setProblem] = useState<string | undefined>();
  usePageTitle(t('resetPassword.requestTitle'));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = emailProblem(t, email);
    setProblem(found);
    if (!found) request.mutate({ email: email.trim() });
  };

  const fieldMessage = problem ?? serverFieldMessage(request.error, 'email');
  return (
    <form className={styles.form} onSubmit={submit} noValidate>
      <Text as="h1" size={700} weight="semibold" className={styles.heading}>{t('resetPassword.requestTitle')}</Text>
      <Text as="p" className={styles.intro}>{t('resetPassword.requestIntro')}</Text>
      {request.isSuccess ? <FormAlert intent="success">{t('resetPassword.requestSent', { email: request.variables.email })}</FormAlert> : null}
      {request.isError && !serverFieldMessage(request.error, 'email') ? <FormAlert intent="error">{describeError(t, request.error)}</FormAlert> : null}
      <Field label={t('resetPassword.email')} required validationMessage={fieldMessage}>
        <Input type="email" name="email" autoComplete="username" value={email} onChange={(_event, data) => setEmail(data.value)} />
      </Field>
      <div className={styles.actions}>
        <Button type="submit" appearance="primary" disabled={request.isPending}>
          {request.isPending ? t('resetPassword.requestSubmitting') : t('resetPassword.requestSubmit')}
        </Button>
        <TextLink to="/sign-in">{t('resetPassword.backToSignIn')}</TextLink>
      </div>
    </form>
  );
}
