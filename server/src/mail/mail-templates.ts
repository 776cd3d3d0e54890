import { asUiLanguage, DEFAULT_TIME_ZONE, type UiLanguage } from '@mantlepiece/shared';

export type MailContent =
  | { kind: 'invitation'; name: string; inviterName: string; link: string; expiresAt: Date }
  | { kind: 'password-reset'; name: string; link: string; expiresAt: Date }
  /** An in-app notification sent on by mail: its words come already in the recipient's language. */
  | { kind: 'notification'; name: string; subject: string; body: string; link: string }
  | { kind: 'translator-assignment'; name: string; locales: string[]; link: string }
  | { kind: 'stale-digest'; name: string; stories: { title: string; locale: string; units: number }[]; link: string }
  /** `timeZone`: the kiosk's venue's, whose clock the moment is told by. */
  | { kind: 'kiosk-silent'; name: string; station: string; gallery: string; since: Date; timeZone: string; link: string }
  | { kind: 'kiosk-back'; name: string; station: string; gallery: string; backAt: Date; timeZone: string; link: string };

/** A message's words: the paragraphs before its link and after it. */
interface MailWords {
  subject: string;
  before: string[];
  after: string[];
}

/**
 * A moment on a venue's clock, the zone named after it ("… 10:30 PM Pacific/Auckland"). A link's
 * expiry belongs to a person, not a venue, and is told in UTC.
 */
const when = (date: Date, language: UiLanguage, timeZone = DEFAULT_TIME_ZONE) =>
  `${new Intl.DateTimeFormat(language, { dateStyle: 'long', timeStyle: 'short', timeZone }).format(date)} ${timeZone}`;

/** "French and Spanish", in the reader's language. */
const languageList = (locales: readonly string[], language: UiLanguage) => {
  const names = new Intl.DisplayNames(language, { type: 'language' });
  return new Intl.ListFormat(language, { type: 'conjunction' }).format(locales.map((locale) => names.of(locale) ?? locale));
};

const staleLines = (stories: Extract<MailContent, { kind: 'stale-digest' }>['stories'], language: UiLanguage) =>
  stories.map(({ title, locale, units }) => `• ${title} (${languageList([locale], language)}): ${units}`);

type Templates = { [K in MailContent['kind']]: (c: Extract<MailContent, { kind: K }>, l: UiLanguage) => MailWords };

const templates: Record<UiLanguage, Templates> = {
  en: {
    invitation: (c, l) => ({
      subject: 'You are invited to Mantlepiece',
      before: [
        `Hello ${c.name},`,
        `${c.inviterName} has invited you to Mantlepiece, where our gallery stories are written, checked and published.`,
        'Open this link to choose your password and sign in:',
      ],
      after: [
        `The link works once and expires on ${when(c.expiresAt, l)}. If you did not expect this invitation, you can ignore this message.`,
      ],
    }),
    'password-reset': (c, l) => ({
      subject: 'Reset your Mantlepiece password',
      before: [
        `Hello ${c.name},`,
        'Someone asked to reset the password of your Mantlepiece account. Open this link to choose a new one:',
      ],
      after: [
        `The link works once and expires on ${when(c.expiresAt, l)}. If you did not ask for this, ignore this message: your password stays as it is.`,
      ],
    }),
    notification: (c) => ({
      subject: c.subject,
      before: [`Hello ${c.name},`, c.body, 'Open it in the studio:'],
      after: ['You can turn off e-mails of this kind in your notification settings in the studio.'],
    }),
    'translator-assignment': (c, l) => ({
      subject: `You now translate into ${languageList(c.locales, l)}`,
      before: [
        `Hello ${c.name},`,
        `You have been given ${languageList(c.locales, l)} as translation languages in Mantlepiece. The stories waiting for you are in your worklist:`,
      ],
      after: ['Each unit shows its source beside your translation, with its length budget and the panel previewed as a kiosk draws it.'],
    }),
    'stale-digest': (c, l) => ({
      subject: 'Source text changed under your translations',
      before: [
        `Hello ${c.name},`,
        'Curators have edited the source of units you had translated. Those translations are now marked stale, with the old and new source side by side. Units per story:',
        ...staleLines(c.stories, l),
      ],
      after: ['Until a stale unit is translated again, a release shows it only if the venue allows falling back to the source.'],
    }),
    'kiosk-silent': (c, l) => ({
      subject: `Kiosk silent: ${c.station}, ${c.gallery}`,
      before: [
        `Hello ${c.name},`,
        `The kiosk at ${c.station} in ${c.gallery} has sent no heartbeat since ${when(c.since, l, c.timeZone)}. It may have lost power or its network, or its browser may have closed. Its page on the Fleet shows what it last reported:`,
      ],
      after: ['You will get one more message when it reports again.'],
    }),
    'kiosk-back': (c, l) => ({
      subject: `Kiosk back: ${c.station}, ${c.gallery}`,
      before: [
        `Hello ${c.name},`,
        `The kiosk at ${c.station} in ${c.gallery} reported again at ${when(c.backAt, l, c.timeZone)}. Check on its page that it plays the live release:`,
      ],
      after: [],
    }),
  },
  fr: {
    invitation: (c, l) => ({
      subject: 'Vous êtes invité·e sur Mantlepiece',
      before: [
        `Bonjour ${c.name},`,
        `${c.inviterName} vous invite sur Mantlepiece, où nous écrivons, vérifions et publions les récits de nos galeries.`,
        'Ouvrez ce lien pour choisir votre mot de passe et vous connecter :',
      ],
      after: [
        `Le lien ne fonctionne qu’une fois et expire le ${when(c.expiresAt, l)}. Si vous n’attendiez pas cette invitation, ignorez ce message.`,
      ],
    }),
    'password-reset': (c, l) => ({
      subject: 'Réinitialisez votre mot de passe Mantlepiece',
      before: [
        `Bonjour ${c.name},`,
        'Quelqu’un a demandé à réinitialiser le mot de passe de votre compte Mantlepiece. Ouvrez ce lien pour en choisir un nouveau :',
      ],
      after: [
        `Le lien ne fonctionne qu’une fois et expire le ${when(c.expiresAt, l)}. Si vous n’êtes pas à l’origine de cette demande, ignorez ce message : votre mot de passe reste inchangé.`,
      ],
    }),
    notification: (c) => ({
      subject: c.subject,
      before: [`Bonjour ${c.name},`, c.body, 'Ouvrez-le dans le studio :'],
      after: ['Vous pouvez désactiver les e-mails de ce type dans vos réglages de notification, dans le studio.'],
    }),
    'translator-assignment': (c, l) => ({
      subject: `Vous traduisez désormais en ${languageList(c.locales, l)}`,
      before: [
        `Bonjour ${c.name},`,
        `Vous avez reçu ${languageList(c.locales, l)} comme langues de traduction dans Mantlepiece. Les récits qui vous attendent sont dans votre liste de travail :`,
      ],
      after: ['Chaque unité montre sa source à côté de votre traduction, avec son budget de longueur et l’aperçu du panneau tel qu’une borne l’affiche.'],
    }),
    'stale-digest': (c, l) => ({
      subject: 'Le texte source a changé sous vos traductions',
      before: [
        `Bonjour ${c.name},`,
        'Des conservateurs ont modifié la source d’unités que vous aviez traduites. Ces traductions sont désormais marquées périmées, avec l’ancienne et la nouvelle source côte à côte. Unités par récit :',
        ...staleLines(c.stories, l),
      ],
      after: ['Tant qu’une unité périmée n’est pas retraduite, une publication ne l’affiche que si le lieu permet de revenir à la source.'],
    }),
    'kiosk-silent': (c, l) => ({
      subject: `Borne muette : ${c.station}, ${c.gallery}`,
      before: [
        `Bonjour ${c.name},`,
        `La borne du poste ${c.station} (${c.gallery}) n’a envoyé aucun signal de vie depuis le ${when(c.since, l, c.timeZone)}. Elle a peut-être perdu le courant ou le réseau, ou son navigateur s’est fermé. Sa page dans la Flotte montre ce qu’elle a signalé en dernier :`,
      ],
      after: ['Vous recevrez un seul autre message, quand elle se manifestera de nouveau.'],
    }),
    'kiosk-back': (c, l) => ({
      subject: `Borne de retour : ${c.station}, ${c.gallery}`,
      before: [
        `Bonjour ${c.name},`,
        `La borne du poste ${c.station} (${c.gallery}) s’est de nouveau manifestée le ${when(c.backAt, l, c.timeZone)}. Vérifiez sur sa page qu’elle diffuse la publication en ligne :`,
      ],
      after: [],
    }),
  },
  es: {
    invitation: (c, l) => ({
      subject: 'Le invitan a Mantlepiece',
      before: [
        `Hola, ${c.name}:`,
        `${c.inviterName} le ha invitado a Mantlepiece, donde escribimos, revisamos y publicamos las historias de nuestras salas.`,
        'Abra este enlace para elegir su contraseña e iniciar sesión:',
      ],
      after: [
        `El enlace funciona una sola vez y caduca el ${when(c.expiresAt, l)}. Si no esperaba esta invitación, puede ignorar este mensaje.`,
      ],
    }),
    'password-reset': (c, l) => ({
      subject: 'Restablezca su contraseña de Mantlepiece',
      before: [
        `Hola, ${c.name}:`,
        'Alguien ha pedido restablecer la contraseña de su cuenta de Mantlepiece. Abra este enlace para elegir una nueva:',
      ],
      after: [
        `El enlace funciona una sola vez y caduca el ${when(c.expiresAt, l)}. Si no lo ha pedido usted, ignore este mensaje: su contraseña sigue siendo la misma.`,
      ],
    }),
    notification: (c) => ({
      subject: c.subject,
      before: [`Hola, ${c.name}:`, c.body, 'Ábralo en el estudio:'],
      after: ['Puede desactivar los correos de este tipo en sus ajustes de avisos del estudio.'],
    }),
    'translator-assignment': (c, l) => ({
      subject: `Ahora traduce a ${languageList(c.locales, l)}`,
      before: [
        `Hola, ${c.name}:`,
        `Desde ahora traduce a ${languageList(c.locales, l)} en Mantlepiece. Las historias que le esperan están en su lista de trabajo:`,
      ],
      after: ['Cada unidad muestra el original junto a su traducción, con su presupuesto de longitud y la vista previa del panel tal como lo dibuja un quiosco.'],
    }),
    'stale-digest': (c, l) => ({
      subject: 'El texto original ha cambiado bajo sus traducciones',
      before: [
        `Hola, ${c.name}:`,
        'Los curadores han editado el original de unidades que usted había traducido. Esas traducciones quedan marcadas como desactualizadas, con el original antiguo y el nuevo uno al lado del otro. Unidades por historia:',
        ...staleLines(c.stories, l),
      ],
      after: ['Mientras una unidad desactualizada no se vuelva a traducir, una publicación solo la muestra si el centro permite recurrir al original.'],
    }),
    'kiosk-silent': (c, l) => ({
      subject: `Quiosco en silencio: ${c.station}, ${c.gallery}`,
      before: [
        `Hola, ${c.name}:`,
        `El quiosco del puesto ${c.station} (${c.gallery}) no envía ninguna señal de vida desde el ${when(c.since, l, c.timeZone)}. Puede que se haya quedado sin corriente o sin red, o que se haya cerrado su navegador. Su página en la Flota muestra lo último que informó:`,
      ],
      after: ['Recibirá un único mensaje más, cuando vuelva a dar señales.'],
    }),
    'kiosk-back': (c, l) => ({
      subject: `Quiosco de vuelta: ${c.station}, ${c.gallery}`,
      before: [
        `Hola, ${c.name}:`,
        `El quiosco del puesto ${c.station} (${c.gallery}) volvió a dar señales el ${when(c.backAt, l, c.timeZone)}. Compruebe en su página que reproduce la publicación en servicio:`,
      ],
      after: [],
    }),
  },
  ar: {
    invitation: (c, l) => ({
      subject: 'دعوة للانضمام إلى Mantlepiece',
      before: [
        `مرحبًا ${c.name}،`,
        `دعاك ${c.inviterName} إلى Mantlepiece، حيث نكتب قصص قاعاتنا ونراجعها وننشرها.`,
        'افتح هذا الرابط لاختيار كلمة المرور وتسجيل الدخول:',
      ],
      after: [
        `يعمل الرابط مرة واحدة وتنتهي صلاحيته في ${when(c.expiresAt, l)}. إن لم تكن تتوقع هذه الدعوة، فتجاهل هذه الرسالة.`,
      ],
    }),
    'password-reset': (c, l) => ({
      subject: 'إعادة تعيين كلمة مرور Mantlepiece',
      before: [
        `مرحبًا ${c.name}،`,
        'طلب أحدهم إعادة تعيين كلمة مرور حسابك في Mantlepiece. افتح هذا الرابط لاختيار كلمة جديدة:',
      ],
      after: [
        `يعمل الرابط مرة واحدة وتنتهي صلاحيته في ${when(c.expiresAt, l)}. إن لم تطلب ذلك، فتجاهل هذه الرسالة: تبقى كلمة مرورك كما هي.`,
      ],
    }),
    notification: (c) => ({
      subject: c.subject,
      before: [`مرحبًا ${c.name}،`, c.body, 'افتحه في الاستوديو:'],
      after: ['يمكنك إيقاف رسائل البريد من هذا النوع من إعدادات الإشعارات في الاستوديو.'],
    }),
    'translator-assignment': (c, l) => ({
      subject: `أصبحت تترجم إلى ${languageList(c.locales, l)}`,
      before: [
        `مرحبًا ${c.name}،`,
        `أُسندت إليك الترجمة إلى ${languageList(c.locales, l)} في Mantlepiece. القصص التي تنتظرك في قائمة عملك:`,
      ],
      after: ['تعرض كل وحدة مصدرها بجانب ترجمتك، مع ميزانية طولها ومعاينة اللوحة كما يرسمها الكشك.'],
    }),
    'stale-digest': (c, l) => ({
      subject: 'تغيّر النص المصدر لترجماتك',
      before: [
        `مرحبًا ${c.name}،`,
        'عدّل المؤلفون مصدر وحدات كنت قد ترجمتها. صارت تلك الترجمات متقادمة، والمصدر القديم والجديد متجاوران. عدد الوحدات في كل قصة:',
        ...staleLines(c.stories, l),
      ],
      after: ['إلى أن تُترجم الوحدة المتقادمة من جديد، لا يعرضها الإصدار إلا إذا سمح المركز بالرجوع إلى المصدر.'],
    }),
    'kiosk-silent': (c, l) => ({
      subject: `كشك صامت: ${c.station}، ${c.gallery}`,
      before: [
        `مرحبًا ${c.name}،`,
        `لم يرسل الكشك في المحطة ${c.station} بقاعة ${c.gallery} أي نبضة حالة منذ ${when(c.since, l, c.timeZone)}. ربما انقطعت عنه الكهرباء أو الشبكة، أو أُغلق متصفحه. تعرض صفحته في الأسطول آخر ما أبلغ عنه:`,
      ],
      after: ['ستصلك رسالة واحدة أخرى حين يعود إلى الإبلاغ.'],
    }),
    'kiosk-back': (c, l) => ({
      subject: `عاد الكشك: ${c.station}، ${c.gallery}`,
      before: [
        `مرحبًا ${c.name}،`,
        `عاد الكشك في المحطة ${c.station} بقاعة ${c.gallery} إلى الإبلاغ في ${when(c.backAt, l, c.timeZone)}. تحقّق في صفحته من أنه يعرض الإصدار المعروض حاليًا:`,
      ],
      after: [],
    }),
  },
};

/** The message in the recipient's UI language (English when we do not write theirs). */
export function renderMail(content: MailContent, uiLanguage: string): { subject: string; text: string; html: string } {
  const language = asUiLanguage(uiLanguage);
  const render = templates[language][content.kind] as (c: MailContent, l: UiLanguage) => MailWords;
  const { subject, before, after } = render(content, language);
  const text = [...before, content.link, ...after].join('\n\n');
  const paragraph = (p: string) => `<p>${escapeHtml(p)}</p>`;
  const html = [
    ...before.map(paragraph),
    `<p><a href="${escapeHtml(content.link)}">${escapeHtml(content.link)}</a></p>`,
    ...after.map(paragraph),
  ].join('\n');
  return { subject, text: `${text}\n`, html: `<!doctype html>\n<html lang="${language}" dir="${language === 'ar' ? 'rtl' : 'ltr'}"><body>\n${html}\n</body></html>\n` };
}

function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (ch) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[ch]!);
}
