import { makeStyles, tokens } from '@fluentui/react-components';
import { directionOf, type TextPiece } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { useReviewStyles } from './review-styles';

const useStyles = makeStyles({
  text: { margin: 0, lineHeight: tokens.lineHeightBase400, whiteSpace: 'pre-wrap', overflowWrap: 'anywhere' },
  // Underline and strike-through carry the meaning; the colours only help.
  added: { backgroundColor: '#dcefd9', color: '#17421a', textDecorationLine: 'underline', textDecorationThickness: '2px', textUnderlineOffset: '3px' },
  removed: { backgroundColor: '#f7dcd3', color: '#6b1d08', textDecorationLine: 'line-through', textDecorationThickness: '2px' },
});

/** A panel's running text, word by word, with insertions underlined and deletions struck through. */
export function TextDiff({ pieces, locale }: { pieces: TextPiece[]; locale: string }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const shared = useReviewStyles();
  return (
    <p className={styles.text} lang={locale} dir={directionOf(locale)} data-text-diff>
      {pieces.map((piece, index) => {
        if (piece.kind === 'same') return <span key={index}>{piece.text}</span>;
        const Tag = piece.kind === 'added' ? 'ins' : 'del';
        return (
          <Tag key={index} className={piece.kind === 'added' ? styles.added : styles.removed}>
            <span className={shared.visuallyHidden}>{t(piece.kind === 'added' ? 'diff.insertedStart' : 'diff.deletedStart')}</span>
            {piece.text}
            <span className={shared.visuallyHidden}>{t(piece.kind === 'added' ? 'diff.insertedEnd' : 'diff.deletedEnd')}</span>
          </Tag>
        );
      })}
    </p>
  );
}
