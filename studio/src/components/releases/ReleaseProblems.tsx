import { makeStyles, MessageBar, MessageBarBody, MessageBarTitle, Text, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import type { ApiErrorBody } from '@mantlepiece/shared';
import { groupReleaseProblems } from './release-problems';

const useStyles = makeStyles({
  section: { marginTop: tokens.spacingVerticalS },
  list: { margin: `${tokens.spacingVerticalXXS} 0 0`, paddingInlineStart: tokens.spacingHorizontalXL },
});

/**
 * What stops a build (the server's 422, or its preview's problems), grouped so a technician sees
 * whom to ask: translators, the media library, curators.
 */
export function ReleaseProblems({ title, errors }: { title: string; errors: NonNullable<ApiErrorBody['errors']> }) {
  const { t } = useTranslation();
  const styles = useStyles();
  return (
    <MessageBar intent="error" role="alert" layout="multiline">
      <MessageBarBody>
        <MessageBarTitle>{title}</MessageBarTitle>
        {groupReleaseProblems(errors).map((section) => (
          <div key={section.group} className={styles.section}>
            <Text weight="semibold">{t(`releases.problems.${section.group}`)}</Text>
            <ul className={styles.list}>
              {section.messages.map((message, index) => <li key={index}>{message}</li>)}
            </ul>
          </div>
        ))}
      </MessageBarBody>
    </MessageBar>
  );
}
