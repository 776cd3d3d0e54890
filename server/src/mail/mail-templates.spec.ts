import { describe, expect, it } from 'vitest';
import { UI_LANGUAGE_CODES } from '@mantlepiece/shared';
import { renderMail, type MailContent } from './mail-templates.js';

const at = new Date('2031-03-14T09:30:00Z');
const link = 'http://studio.test/x';
const contents: MailContent[] = [
  { kind: 'invitation', name: 'Lucía Ortega', inviterName: 'Noor Haddad', link, expiresAt: at },
  { kind: 'password-reset', name: 'Lucía Ortega', link, expiresAt: at },
  { kind: 'notification', name: 'Lucía Ortega', subject: 'Asunto', body: 'Cuerpo', link },
  { kind: 'translator-assignment', name: 'Lucía Ortega', locales: ['fr', 'es'], link },
  { kind: 'stale-digest', name: 'Lucía Ortega', stories: [{ title: 'Plates on the move', locale: 'es', units: 3 }], link },
  { kind: 'kiosk-silent', name: 'Lucía Ortega', station: 'Ridge table', gallery: 'Moving Plates Hall', since: at, timeZone: 'UTC', link },
  { kind: 'kiosk-back', name: 'Lucía Ortega', station: 'Ridge table', gallery: 'Moving Plates Hall', backAt: at, timeZone: 'UTC', link },
];

describe('mail templates', () => {
  it.each(UI_LANGUAGE_CODES)('writes every kind of message in %s, with the link, differently from English', (language) => {
    for (const content of contents) {
      const mail = renderMail(content, language);
      expect(mail.text, `${language} ${content.kind}`).toContain(link);
      expect(mail.html).toContain(`<html lang="${language}"`);
      if (language !== 'en' && content.kind !== 'notification') expect(mail.subject).not.toBe(renderMail(content, 'en').subject);
    }
  });

  it('names the languages and the date in Spanish', () => {
    const mail = renderMail(contents[3]!, 'es');
    expect(mail.subject).toBe('Ahora traduce a francés y español');
    expect(renderMail(contents[0]!, 'es').text).toContain('caduca el 14 de marzo de 2031');
  });

  // New Zealand keeps daylight time (UTC+13) until the first Sunday of April (New Zealand Daylight Time Order 2007): 09:30 UTC on 14 March is 22:30 there.
  it("tells a kiosk's moments on its venue's clock and names the zone", () => {
    const mail = renderMail({ ...contents[5]!, timeZone: 'Pacific/Auckland' } as MailContent, 'en');
    expect(mail.text).toMatch(/has sent no heartbeat since March 14, 2031 at 10:30\sPM Pacific\/Auckland\./);
    expect(renderMail(contents[5]!, 'fr').text).toContain('depuis le 14 mars 2031 à 09:30 UTC.');
  });

  it('sets Arabic mail right to left', () => {
    const mail = renderMail(contents[5]!, 'ar');
    expect(mail.subject).toBe('كشك صامت: Ridge table، Moving Plates Hall');
    expect(mail.html).toContain('<html lang="ar" dir="rtl">');
  });

  it('falls back to English for a language the studio does not speak', () => {
    expect(renderMail(contents[1]!, 'de')).toEqual(renderMail(contents[1]!, 'en'));
  });
});
