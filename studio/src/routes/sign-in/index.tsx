import { Spinner } from '@fluentui/react-components';
import { Navigate, useLocation } from 'react-router-dom';
import { useTranslation } from 'react-i18next';
import { useSession, useSignIn } from '../../api/session';
import { usePageTitle } from '../../app/page-title';
import { SignInForm } from './SignInForm';

/** Where to go after signing in: back to the page that asked, never off the studio. */
function returnPath(state: unknown): string {
  const from = (state as { from?: unknown } | null)?.from;
  return typeof from === 'string' && from.startsWith('/') && !from.startsWith('//') ? from : '/';
}

export function SignInPage() {
  const { t } = useTranslation();
  const session = useSession();
  const signIn = useSignIn();
  const location = useLocation();
  usePageTitle(t('signIn.title'));

  if (session.isPending) return <Spinner label={t('common.restoringSession')} />;
  if (session.data) return <Navigate to={returnPath(location.state)} replace />;
  return <SignInForm pending={signIn.isPending} error={signIn.error} onSubmit={(credentials) => signIn.mutate(credentials)} />;
}
