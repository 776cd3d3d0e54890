import type { NotificationKind, StoryState, UiLanguage, Verdict } from '@mantlepiece/shared';

/** What happened, with the facts a notification tells; each kind is worded below in every UI language. */
export type NotificationEvent =
  | { kind: 'revision_submitted'; storyTitle: string; number: number; submitterName: string }
  | { kind: 'verdict'; storyTitle: string; number: number; verdict: Verdict; reviewerName: string; note: string | null; storyState: StoryState }
  | { kind: 'comment_reply'; storyTitle: string; number: number; replierName: string; body: string };

export interface NotificationWords {
  title: string;
  body: string;
}

type Words = { [K in NotificationKind]: (event: Extract<NotificationEvent, { kind: K }>) => NotificationWords };

const EXCERPT_LENGTH = 200;
const excerpt = (text: string) => (text.length > EXCERPT_LENGTH ? `${text.slice(0, EXCERPT_LENGTH - 1).trimEnd()}…` : text);

const words: Record<UiLanguage, Words> = {
  en: {
    revision_submitted: (e) => ({
      title: `“${e.storyTitle}” is ready for review`,
      body: `${e.submitterName} submitted revision ${e.number} of “${e.storyTitle}” for review.`,
    }),
    verdict: (e) =>
      e.verdict === 'approve'
        ? {
            title: `“${e.storyTitle}”: revision ${e.number} approved`,
            body: e.storyState === 'approved'
              ? `${e.reviewerName} approved revision ${e.number} of “${e.storyTitle}”. It can now go into a release.`
              : `${e.reviewerName} approved revision ${e.number} of “${e.storyTitle}”. It still needs another educator’s approval.`,
          }
        : {
            title: `“${e.storyTitle}”: changes requested`,
            body: `${e.reviewerName} asked for changes to revision ${e.number} of “${e.storyTitle}”: ${excerpt(e.note ?? '')}`,
          },
    comment_reply: (e) => ({
      title: `${e.replierName} replied on “${e.storyTitle}”`,
      body: `${e.replierName} replied to your comment on revision ${e.number} of “${e.storyTitle}”: ${excerpt(e.body)}`,
    }),
  },
  fr: {
    revision_submitted: (e) => ({
      title: `« ${e.storyTitle} » est prêt à être relu`,
      body: `${e.submitterName} a soumis la révision ${e.number} de « ${e.storyTitle} » à la relecture.`,
    }),
    verdict: (e) =>
      e.verdict === 'approve'
        ? {
            title: `« ${e.storyTitle} » : révision ${e.number} approuvée`,
            body: e.storyState === 'approved'
              ? `${e.reviewerName} a approuvé la révision ${e.number} de « ${e.storyTitle} ». Elle peut désormais entrer dans une publication.`
              : `${e.reviewerName} a approuvé la révision ${e.number} de « ${e.storyTitle} ». Il lui faut encore l’approbation d’un·e autre médiateur·rice.`,
          }
        : {
            title: `« ${e.storyTitle} » : modifications demandées`,
            body: `${e.reviewerName} demande des modifications à la révision ${e.number} de « ${e.storyTitle} » : ${excerpt(e.note ?? '')}`,
          },
    comment_reply: (e) => ({
      title: `${e.replierName} a répondu sur « ${e.storyTitle} »`,
      body: `${e.replierName} a répondu à votre commentaire sur la révision ${e.number} de « ${e.storyTitle} » : ${excerpt(e.body)}`,
    }),
  },
  es: {
    revision_submitted: (e) => ({
      title: `«${e.storyTitle}» está lista para revisión`,
      body: `${e.submitterName} ha enviado la versión ${e.number} de «${e.storyTitle}» a revisión.`,
    }),
    verdict: (e) =>
      e.verdict === 'approve'
        ? {
            title: `«${e.storyTitle}»: versión ${e.number} aprobada`,
            body: e.storyState === 'approved'
              ? `${e.reviewerName} ha aprobado la versión ${e.number} de «${e.storyTitle}». Ya puede entrar en una publicación.`
              : `${e.reviewerName} ha aprobado la versión ${e.number} de «${e.storyTitle}». Aún necesita la aprobación de otro educador.`,
          }
        : {
            title: `«${e.storyTitle}»: cambios solicitados`,
            body: `${e.reviewerName} ha pedido cambios en la versión ${e.number} de «${e.storyTitle}»: ${excerpt(e.note ?? '')}`,
          },
    comment_reply: (e) => ({
      title: `${e.replierName} ha respondido en «${e.storyTitle}»`,
      body: `${e.replierName} ha respondido a su comentario sobre la versión ${e.number} de «${e.storyTitle}»: ${excerpt(e.body)}`,
    }),
  },
  ar: {
    revision_submitted: (e) => ({
      title: `«${e.storyTitle}» جاهزة للمراجعة`,
      body: `أرسل ${e.submitterName} النسخة ${e.number} من «${e.storyTitle}» للمراجعة.`,
    }),
    verdict: (e) =>
      e.verdict === 'approve'
        ? {
            title: `«${e.storyTitle}»: اعتُمدت النسخة ${e.number}`,
            body: e.storyState === 'approved'
              ? `اعتمد ${e.reviewerName} النسخة ${e.number} من «${e.storyTitle}». يمكن الآن إدخالها في إصدار.`
              : `اعتمد ${e.reviewerName} النسخة ${e.number} من «${e.storyTitle}». لا تزال تحتاج إلى اعتماد مراجع تربوي آخر.`,
          }
        : {
            title: `«${e.storyTitle}»: مطلوب تعديلات`,
            body: `طلب ${e.reviewerName} تعديلات على النسخة ${e.number} من «${e.storyTitle}»: ${excerpt(e.note ?? '')}`,
          },
    comment_reply: (e) => ({
      title: `ردّ ${e.replierName} على «${e.storyTitle}»`,
      body: `ردّ ${e.replierName} على تعليقك على النسخة ${e.number} من «${e.storyTitle}»: ${excerpt(e.body)}`,
    }),
  },
};

export function wordNotification(event: NotificationEvent, language: UiLanguage): NotificationWords {
  const word = words[language][event.kind] as (e: NotificationEvent) => NotificationWords;
  return word(event);
}
