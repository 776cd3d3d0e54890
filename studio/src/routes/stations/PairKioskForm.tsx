import { useState, type FormEvent } from 'react';
import { Button, Field, Input, makeStyles, Text, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { usePairKiosk } from '../../api/kiosks';
import { FormAlert } from '../../components/forms/FormAlert';
import { describeError, shownAtField, serverFieldMessage } from '../../components/forms/describe-error';
import { looksLikePairingCode, normalisePairingCode } from '@mantlepiece/shared';

const useStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM, maxWidth: '36rem' },
  row: { display: 'flex', gap: tokens.spacingHorizontalM, alignItems: 'flex-start', flexWrap: 'wrap' },
  // Read off a screen across a room and typed back: large, spaced, in capitals.
  code: { width: '14rem', '& input': { fontSize: tokens.fontSizeBase500, letterSpacing: '0.3em', textTransform: 'uppercase', fontVariantNumeric: 'tabular-nums' } },
  submit: { marginTop: '1.6rem' },
  steps: { color: tokens.colorNeutralForeground2, margin: 0 },
});

/** "Pair a kiosk": the technician types the code the new kiosk shows; the kiosk collects its credential by itself. */
export function PairKioskForm({ stationId, stationName }: { stationId: number; stationName: string }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const pair = usePairKiosk(stationId);
  const [code, setCode] = useState('');
  const [problem, setProblem] = useState<string | null>(null);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!looksLikePairingCode(code)) {
      setProblem(t('stations.pair.codeShape'));
      return;
    }
    setProblem(null);
    pair.mutate(normalisePairingCode(code), { onSuccess: () => setCode('') });
  };

  const fieldMessage = problem ?? serverFieldMessage(pair.error, 'pairingCode');
  return (
    <form className={styles.form} onSubmit={submit} noValidate aria-label={t('stations.pair.title')}>
      <Text as="p" className={styles.steps}>{t('stations.pair.steps', { station: stationName })}</Text>
      <div className={styles.row}>
        <Field label={t('stations.pair.code')} validationMessage={fieldMessage} validationState={fieldMessage ? 'error' : 'none'}>
          <Input
            className={styles.code}
            value={code}
            onChange={(_event, data) => { setCode(data.value); setProblem(null); pair.reset(); }}
            autoComplete="off"
            spellCheck={false}
            maxLength={12}
          />
        </Field>
        <Button type="submit" appearance="primary" className={styles.submit} disabled={pair.isPending}>
          {pair.isPending ? t('stations.pair.pairing') : t('stations.pair.submit')}
        </Button>
      </div>
      {pair.error && !shownAtField(pair.error, ['pairingCode']) ? <FormAlert intent="error">{describeError(t, pair.error)}</FormAlert> : null}
      {pair.isSuccess ? <FormAlert intent="success">{t('stations.pair.paired', { id: pair.data.kioskId })}</FormAlert> : null}
    </form>
  );
}
