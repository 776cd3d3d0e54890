import { Field, Input } from '@fluentui/react-components';
import { MIN_PASSWORD_LENGTH } from './validation';

export interface NewPassword {
  password: string;
  confirm: string;
}

/** A new password typed twice, with the length rule shown before anyone gets it wrong. */
export function NewPasswordFields({ value, onChange, labels, problems }: {
  value: NewPassword;
  onChange: (value: NewPassword) => void;
  labels: { password: string; hint: string; confirm: string };
  problems: Partial<Record<keyof NewPassword, string>>;
}) {
  return (
    <>
      <Field label={labels.password} hint={labels.hint} required validationMessage={problems.password}>
        <Input
          type="password"
          name="new-password"
          autoComplete="new-password"
          minLength={MIN_PASSWORD_LENGTH}
          value={value.password}
          onChange={(_event, data) => onChange({ ...value, password: data.value })}
        />
      </Field>
      <Field label={labels.confirm} required validationMessage={problems.confirm}>
        <Input
          type="password"
          name="confirm-password"
          autoComplete="new-password"
          value={value.confirm}
          onChange={(_event, data) => onChange({ ...value, confirm: data.value })}
        />
      </Field>
    </>
  );
}
