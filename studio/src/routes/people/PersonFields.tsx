import { Checkbox, Field, Input, makeStyles, Select, Text, tokens, useId } from '@fluentui/react-components';
import { ROLES, type Role } from '@mantlepiece/shared';
import type { TFunction } from 'i18next';
import { useTranslation } from 'react-i18next';
import { ApiError } from '../../api/client';
import { serverFieldMessage } from '../../components/forms/describe-error';
import { LanguagePicker } from '../../components/forms/LanguagePicker';
import { emailProblem, parseLocales, requiredProblem, type FieldProblems } from '../../components/forms/validation';

export interface PersonValues {
  email: string;
  name: string;
  /** Where the roles hold: one venue, or every venue (null). */
  venueId: number | null;
  roles: Role[];
  locales: string;
}

export type PersonField = keyof PersonValues;
export const PERSON_FIELDS: readonly PersonField[] = ['email', 'name', 'venueId', 'roles', 'locales'];

/** The venues the form offers, and the grant a person already holds at each (editing), so choosing a venue shows its roles. */
export interface VenueChoices {
  venues: readonly { id: number; name: string }[];
  everyVenue: boolean;
  grantAt?: (venueId: number | null) => { roles: Role[]; locales: string[] };
}

const useStyles = makeStyles({
  fieldset: { border: 0, margin: 0, padding: 0, minWidth: 0 },
  legend: { padding: 0, marginBottom: tokens.spacingVerticalXXS, fontSize: tokens.fontSizeBase300, lineHeight: tokens.lineHeightBase300, color: tokens.colorNeutralForeground1 },
  roles: { display: 'grid', gridTemplateColumns: 'repeat(auto-fill, minmax(10rem, 1fr))', columnGap: tokens.spacingHorizontalM },
  error: { display: 'block', color: tokens.colorPaletteRedForeground1, marginTop: tokens.spacingVerticalXXS },
});

/** Checks a person's details the way the server will, so most mistakes never make a round trip. */
export function personProblems(t: TFunction, values: PersonValues, { withEmail, roleRequired = true }: { withEmail: boolean; roleRequired?: boolean }): FieldProblems<PersonField> {
  const { locales, invalid } = parseLocales(values.locales);
  const translator = values.roles.includes('translator');
  return {
    email: withEmail ? emailProblem(t, values.email) : undefined,
    name: requiredProblem(t, values.name),
    venueId: undefined,
    roles: values.roles.length || !roleRequired ? undefined : t('validation.rolesRequired'),
    locales: invalid
      ? t('validation.localeInvalid', { tag: invalid })
      : translator && locales.length === 0 ? t('validation.localesRequired') : undefined,
  };
}

/** The locales to send: a person who does not translate has none. */
export const localesToSend = (values: PersonValues) => (values.roles.includes('translator') ? parseLocales(values.locales).locales : []);

/** The message next to a field: the form's own check first, then what the server said. */
export function personFieldMessage(t: TFunction, field: PersonField, problems: FieldProblems<PersonField>, error: unknown): string | undefined {
  if (problems[field]) return problems[field];
  if (field === 'email' && error instanceof ApiError && error.status === 409) return t('invite.alreadyMember');
  return serverFieldMessage(error, field);
}

/** Email (when inviting), name, the venue, roles there and translator locales, shared by the invite and edit dialogs. */
export function PersonFields({ values, onChange, messages, emailEditable, choices }: {
  values: PersonValues;
  onChange: (values: PersonValues) => void;
  messages: Partial<Record<PersonField, string>>;
  emailEditable: boolean;
  choices?: VenueChoices;
}) {
  const { t } = useTranslation();
  const styles = useStyles();
  const rolesMessageId = useId('roles-message');
  const toggleRole = (role: Role, checked: boolean) =>
    onChange({ ...values, roles: checked ? ROLES.filter((r) => r === role || values.roles.includes(r)) : values.roles.filter((r) => r !== role) });

  return (
    <>
      <Field label={t('personForm.email')} required={emailEditable} validationMessage={messages.email}>
        <Input type="email" name="email" value={values.email} readOnly={!emailEditable} onChange={(_event, data) => onChange({ ...values, email: data.value })} />
      </Field>
      <Field label={t('personForm.name')} required validationMessage={messages.name}>
        <Input name="name" value={values.name} onChange={(_event, data) => onChange({ ...values, name: data.value })} />
      </Field>
      {choices && (choices.venues.length > 1 || choices.everyVenue) ? (
        <Field
          label={t('memberships.venue')}
          hint={values.venueId === null ? t('memberships.everyVenueHint') : t('memberships.venueHint')}
          validationMessage={messages.venueId}
        >
          <Select
            value={values.venueId === null ? '' : String(values.venueId)}
            onChange={(_event, data) => {
              const venueId = data.value ? Number(data.value) : null;
              const grant = choices.grantAt?.(venueId);
              onChange({ ...values, venueId, ...(grant ? { roles: grant.roles, locales: grant.locales.join(', ') } : {}) });
            }}
          >
            {choices.everyVenue ? <option value="">{t('memberships.everyVenue')}</option> : null}
            {choices.venues.map((venue) => <option key={venue.id} value={String(venue.id)}>{venue.name}</option>)}
          </Select>
        </Field>
      ) : null}
      {/* A fieldset, not a Field: Fluent's Field hands its one id to every checkbox inside it. */}
      <fieldset className={styles.fieldset} aria-describedby={messages.roles ? rolesMessageId : undefined}>
        <legend className={styles.legend}>{t('personForm.roles')}</legend>
        <div className={styles.roles}>
          {ROLES.map((role) => (
            <Checkbox
              key={role}
              label={t(`roles.${role}`)}
              checked={values.roles.includes(role)}
              onChange={(_event, data) => toggleRole(role, data.checked === true)}
            />
          ))}
        </div>
        {messages.roles ? <Text id={rolesMessageId} role="alert" size={200} className={styles.error}>{messages.roles}</Text> : null}
      </fieldset>
      {values.roles.includes('translator') ? (
        <Field label={t('personForm.locales')} required validationMessage={messages.locales}>
          <LanguagePicker multiple value={parseLocales(values.locales).locales} onChange={(tags) => onChange({ ...values, locales: tags.join(', ') })} />
        </Field>
      ) : null}
    </>
  );
}
