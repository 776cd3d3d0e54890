import { useState } from 'react';
import { useTranslation } from 'react-i18next';
import { FormDialog } from '../../components/FormDialog';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError, shownAtField } from '../../components/forms/describe-error';
import { hasProblems } from '../../components/forms/validation';
import { PERSON_FIELDS, PersonFields, personFieldMessage, personProblems, type PersonField, type PersonValues, type VenueChoices } from './PersonFields';

export interface PersonDialogProps {
  title: string;
  intro?: string;
  submitLabel: string;
  pendingLabel: string;
  initial: PersonValues;
  emailEditable: boolean;
  /** Where the roles may hold; without it the form has no venue field. */
  choices?: VenueChoices;
  /** Editing may leave a venue with no roles (ending the membership); an invitation needs one. */
  roleRequired?: boolean;
  pending: boolean;
  error: unknown;
  onSubmit: (values: PersonValues) => void;
  onClose: () => void;
}

/** A person's details in a dialog: checks them, submits, and puts the server's answer by each field. */
export function PersonDialog(props: PersonDialogProps) {
  const { t } = useTranslation();
  const [values, setValues] = useState(props.initial);
  const [problems, setProblems] = useState<Partial<Record<PersonField, string>>>({});

  const check = (next: PersonValues) => personProblems(t, next, { withEmail: props.emailEditable, roleRequired: props.roleRequired });
  const submit = () => {
    const found = check(values);
    setProblems(found);
    if (!hasProblems(found)) props.onSubmit(values);
  };
  // Once a submit has shown problems, each change re-checks, so a mended field loses its message at once.
  const change = (next: PersonValues) => {
    setValues(next);
    setProblems((shown) => (hasProblems(shown) ? check(next) : shown));
  };

  const messages = Object.fromEntries(PERSON_FIELDS.map((field) => [field, personFieldMessage(t, field, problems, props.error)]));
  const alert = props.error && !shownAtField(props.error, PERSON_FIELDS) && !messages.email ? describeError(t, props.error) : null;

  return (
    <FormDialog
      title={props.title}
      intro={props.intro}
      submitLabel={props.pending ? props.pendingLabel : props.submitLabel}
      pending={props.pending}
      onSubmit={submit}
      onClose={props.onClose}
    >
      {alert ? <FormAlert intent="error">{alert}</FormAlert> : null}
      <PersonFields values={values} onChange={change} messages={messages} emailEditable={props.emailEditable} choices={props.choices} />
    </FormDialog>
  );
}
