import { useState, type FormEvent } from 'react';
import { Button, Field, Input, Spinner, Text } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { useNavigate, useParams } from 'react-router-dom';
import { ApiError } from '../../api/client';
import { useAcceptInvitation, useInvitation, type InvitationView } from '../../api/invitations';
import { usePageTitle } from '../../app/page-title';
import { FormAlert } from '../../components/forms/FormAlert';
import { NewPasswordFields, type NewPassword } from '../../components/forms/NewPasswordFields';
import { describeError, serverFieldMessage, shownAtField } from '../../components/forms/describe-error';
import { useFormStyles } from '../../components/forms/styles';
import { hasProblems, MIN_PASSWORD_LENGTH, newPasswordProblems, requiredProblem } from '../../components/forms/validation';
import { useRoleList, useDateFormat } from '../../components/formatting';
import { TextLink } from '../../components/links';

export function InvitationPage() {
  const { t } = useTranslation();
  const { token = '' } = useParams();
  const invitation = useInvitation(token);
  usePageTitle(t('invitation.title'));

  if (invitation.isPending) return <Spinner label={t('common.loading')} />;
  if (invitation.isError) {
    const status = invitation.error instanceof ApiError ? invitation.error.status : undefined;
    const title = status === 410 ? t('invitation.goneTitle') : status === 404 ? t('invitation.notFoundTitle') : t('invitation.title');
    const body = status === 410 ? t('invitation.goneBody') : status === 404 ? t('invitation.notFoundBody') : describeError(t, invitation.error);
    return <InvitationProblem title={title} body={body} />;
  }
  return <AcceptInvitationForm token={token} invitation={invitation.data} />;
}

function InvitationProblem({ title, body }: { title: string; body: string }) {
  const { t } = useTranslation();
  const styles = useFormStyles();
  return (
    <div className={styles.form}>
      <Text as="h1" size={700} weight="semibold" className={styles.heading}>{title}</Text>
      <FormAlert intent="warning">{body}</FormAlert>
      <TextLink to="/sign-in">{t('resetPassword.backToSignIn')}</TextLink>
    </div>
  );
}

function AcceptInvitationForm({ token, invitation }: { token: string; invitation: InvitationView }) {
  const { t } = useTranslation();
  const styles = useFormStyles();
  const navigate = useNavigate();
  const accept = useAcceptInvitation();
  const roleList = useRoleList();
  const formatDate = useDateFormat();
  const [name, setName] = useState(invitation.name);
  const [password, setPassword] = useState<NewPassword>({ password: '', confirm: '' });
  const [problems, setProblems] = useState<{ name?: string; password?: string; confirm?: string }>({});

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = { name: requiredProblem(t, name), ...newPasswordProblems(t, password.password, password.confirm) };
    setProblems(found);
    if (hasProblems(found)) return;
    accept.mutate({ token, name: name.trim(), password: password.password }, { onSuccess: () => void navigate('/', { replace: true }) });
  };

  const error = accept.error;
  const alert = error && !shownAtField(error, ['name', 'password'])
    ? describeError(t, error, { 410: t('invitation.goneBody'), 404: t('invitation.notFoundBody') })
    : null;

  return (
    <form className={styles.form} onSubmit={submit} noValidate>
      <Text as="h1" size={700} weight="semibold" className={styles.heading}>{t('invitation.title')}</Text>
      <Text as="p" className={styles.intro}>{t('invitation.intro', { roles: roleList(invitation.roles) })}</Text>
      {alert ? <FormAlert intent="error">{alert}</FormAlert> : null}
      <Field label={t('invitation.email')}>
        <Input type="email" value={invitation.email} readOnly autoComplete="username" />
      </Field>
      <Field label={t('invitation.name')} required validationMessage={problems.name ?? serverFieldMessage(error, 'name')}>
        <Input name="name" autoComplete="name" value={name} onChange={(_event, data) => setName(data.value)} />
      </Field>
      <NewPasswordFields
        value={password}
        onChange={setPassword}
        labels={{ password: t('invitation.password'), hint: t('invitation.passwordHint', { min: MIN_PASSWORD_LENGTH }), confirm: t('invitation.confirm') }}
        problems={{ password: problems.password ?? serverFieldMessage(error, 'password'), confirm: problems.confirm }}
      />
      <Text size={200}>{t('invitation.expires', { date: formatDate(invitation.expiresAt) })}</Text>
      <div className={styles.actions}>
        <Button type="submit" appearance="primary" disabled={accept.isPending}>
          {accept.isPending ? t('invitation.submitting') : t('invitation.submit')}
        </Button>
      </div>
    </form>
  );
}
