import { useState, type FormEvent } from 'react';
import { Button, Field, Input, Text } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import type { Credentials } from '../../api/session';
import { TextLink } from '../../components/links';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError, serverFieldMessage, shownAtField } from '../../components/forms/describe-error';
import { useFormStyles } from '../../components/forms/styles';
import { emailProblem, hasProblems, requiredProblem, type FieldProblems } from '../../components/forms/validation';

type SignInField = 'email' | 'password';

/** The sign-in form on its own: it checks what it can, and shows what the server answered. */
export function SignInForm({ onSubmit, pending, error }: { onSubmit: (credentials: Credentials) => void; pending: boolean; error: unknown }) {
  const { t } = useTranslation();
  const styles = useFormStyles();
  const [values, setValues] = useState<Credentials>({ email: '', password: '' });
  const [problems, setProblems] = useState<FieldProblems<SignInField>>({});

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = { email: emailProblem(t, values.email), password: requiredProblem(t, values.password) };
    setProblems(found);
    if (!hasProblems(found)) onSubmit({ email: values.email.trim(), password: values.password });
  };

  const fieldMessage = (field: SignInField) => problems[field] ?? serverFieldMessage(error, field);
  const alert = error && !shownAtField(error, ['email', 'password'])
    ? describeError(t, error, { 401: t('signIn.wrongCredentials'), 429: t('signIn.tooManyAttempts') })
    : null;

  return (
    <form className={styles.form} onSubmit={submit} noValidate>
      <Text as="h1" size={700} weight="semibold" className={styles.heading}>{t('signIn.title')}</Text>
      <Text as="p" className={styles.intro}>{t('signIn.intro')}</Text>
      {alert ? <FormAlert intent="error">{alert}</FormAlert> : null}
      <Field label={t('signIn.email')} required validationMessage={fieldMessage('email')}>
        <Input
          type="email"
          name="email"
          autoComplete="username"
          value={values.email}
          onChange={(_event, data) => setValues((current) => ({ ...current, email: data.value }))}
        />
      </Field>
      <Field label={t('signIn.password')} required validationMessage={fieldMessage('password')}>
        <Input
          type="password"
          name="password"
          autoComplete="current-password"
          value={values.password}
          onChange={(_event, data) => setValues((current) => ({ ...current, password: data.value }))}
        />
      </Field>
      <div className={styles.actions}>
        <Button type="submit" appearance="primary" disabled={pending}>
          {pending ? t('signIn.submitting') : t('signIn.submit')}
        </Button>
        <TextLink to="/reset-password">{t('signIn.forgot')}</TextLink>
      </div>
    </form>
  );
}
