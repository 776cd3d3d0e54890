import { MessageBar, MessageBarBody } from '@fluentui/react-components';

/** A form's overall outcome, announced to screen readers as soon as it appears. */
export function FormAlert({ intent, children }: { intent: 'error' | 'success' | 'warning' | 'info'; children: string }) {
  return (
    <MessageBar intent={intent} role={intent === 'error' ? 'alert' : 'status'}>
      <MessageBarBody>{children}</MessageBarBody>
    </MessageBar>
  );
}
