import { useState, type FormEvent } from 'react';
import { Button, Dialog, DialogActions, DialogBody, DialogContent, DialogSurface, DialogTitle, makeStyles, Text, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError, shownAtField } from '../../components/forms/describe-error';
import { hasProblems } from '../../components/forms/validation';
import { PERSON_FIELDS, PersonFields, personFieldMessage, personProblems, type PersonField, type PersonValues } from './PersonFields';

const useStyles = makeStyles({
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  intro: { color: tokens.colorNeutralForeground2 },
});

export interface PersonDialogProps {
  title: string;
  intro?: string;
  submitLabel: string;
  pendingLabel: string;
  initial: PersonValues;
  emailEditable: boolean;
  pending: boolean;
  error: unknown;
  onSubmit: (values: PersonValues) => void;
  onClose: () => void;
}

/** A person's details in a dialog: checks them, submits, and puts the server's answer by each field. */
export function PersonDialog(props: PersonDialogProps) {
  const { t } = useTranslation();
  const styles = useStyles();
  const [values, setValues] = useState(props.initial);
  const [problems, setProblems] = useState<Partial<Record<PersonField, string>>>({});

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = personProblems(t, values, { withEmail: props.emailEditable });
    setProblems(found);
    if (!hasProblems(found)) props.onSubmit(values);
  };

  const messages = Object.fromEntries(PERSON_FIELDS.map((field) => [field, personFieldMessage(t, field, problems, props.error)]));
  const alert = props.error && !shownAtField(props.error, PERSON_FIELDS) && !messages.email ? describeError(t, props.error) : null;

  return (
    <Dialog open modalType="modal" onOpenChange={(_event, data) => { if (!data.open) props.onClose(); }}>
      <DialogSurface>
        <form onSubmit={submit} noValidate>
          <DialogBody>
            <DialogTitle>{props.title}</DialogTitle>
            <DialogContent className={styles.content}>
              {props.intro ? <Text as="p" className={styles.intro}>{props.intro}</Text> : null}
              {alert ? <FormAlert intent="error">{alert}</FormAlert> : null}
              <PersonFields values={values} onChange={setValues} messages={messages} emailEditable={props.emailEditable} />
            </DialogContent>
            <DialogActions>
              <Button appearance="secondary" onClick={props.onClose}>{t('common.cancel')}</Button>
              <Button type="submit" appearance="primary" disabled={props.pending}>
                {props.pending ? props.pendingLabel : props.submitLabel}
              </Button>
            </DialogActions>
          </DialogBody>
        </form>
      </DialogSurface>
    </Dialog>
  );
}
