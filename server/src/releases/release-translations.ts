import { Injectable } from '@nestjs/common';
import type { PanelDocJSON } from '@mantlepiece/shared';
import type { Revision } from '../revisions/models/revision.model.js';
import { TranslationsService } from '../translations/translations.service.js';

/** A target locale in which a revision's texts are not all translated from its own source. */
export interface TranslationGap {
  revisionId: number;
  locale: string;
  total: number;
  untranslated: number;
  stale: number;
}

/**
 * What a release needs from translation, asked of the translations module, whose rules decide
 * completeness and draw the target documents. They are read against each revision's own source,
 * so a story revised after its approval keeps the translations of its approved revision in
 * releases until a newer revision is approved.
 */
@Injectable()
export class ReleaseTranslations {
  constructor(private readonly translations: TranslationsService) {}

  async gapsFor(revisions: Revision[], locales: string[]): Promise<TranslationGap[]> {
    if (locales.length === 0) return [];
    const figures = await this.translations.completenessForRelease(revisions, locales);
    return revisions.flatMap((revision) =>
      locales.flatMap((locale) => {
        const figure = figures.find((f) => f.storyId === revision.storyId && f.locale === locale)!;
        if (figure.complete) return [];
        return [{ revisionId: revision.id, locale, total: figure.total, untranslated: figure.total - figure.translated - figure.stale, stale: figure.stale }];
      }),
    );
  }

  /**
   * Per panel id, per target locale, the drawn document; and the title in each target locale
   * where it is translated (elsewhere the kiosk shows the source's, as the venue allowed).
   */
  async documentsFor(revision: Revision, locales: string[]): Promise<{ docs: Record<number, Record<string, PanelDocJSON>>; titles: Record<string, string> }> {
    const docs: Record<number, Record<string, PanelDocJSON>> = {};
    const titles: Record<string, string> = {};
    for (const locale of locales) {
      const drawn = await this.translations.targetDocumentsAt(revision, locale);
      for (const panel of drawn.panels) (docs[panel.panelId] ??= {})[locale] = panel.doc;
      if (drawn.title !== null) titles[locale] = drawn.title;
    }
    return { docs, titles };
  }
}
