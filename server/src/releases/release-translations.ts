import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { canonicalJson, type PanelDocJSON } from '@mantlepiece/shared';
import { PanelDocument } from '../panels/models/panel-document.model.js';
import { Panel } from '../panels/models/panel.model.js';
import type { Revision } from '../revisions/models/revision.model.js';
import { TranslationsService } from '../translations/translations.service.js';

/** A target locale in which a revision's texts are not all translated from their current source. */
export interface TranslationGap {
  revisionId: number;
  locale: string;
  total: number;
  untranslated: number;
  stale: number;
  /** The story's draft has moved on since the revision, so its translations follow the draft instead. */
  draftChanged: boolean;
}

/**
 * What a release needs from translation, asked of the translations module, whose rules decide
 * completeness and draw the target documents. Translations follow a story's current draft; a
 * panel whose draft no longer matches the revision has no translation the release can trust.
 */
@Injectable()
export class ReleaseTranslations {
  constructor(
    private readonly translations: TranslationsService,
    @InjectModel(Panel) private readonly panels: typeof Panel,
  ) {}

  async gapsFor(revisions: Revision[], locales: string[]): Promise<TranslationGap[]> {
    if (locales.length === 0) return [];
    const figures = await this.translations.completenessForRelease(revisions.map((r) => r.storyId), locales);
    const drafts = await Promise.all(revisions.map((revision) => this.matchingPanels(revision)));
    return revisions.flatMap((revision, index) => {
      const matching = drafts[index]!;
      const draftChanged = matching.size !== revision.snapshot.panels.length;
      return locales.flatMap((locale) => {
        const figure = figures.find((f) => f.storyId === revision.storyId && f.locale === locale);
        if (!draftChanged && figure?.complete) return [];
        return [{
          revisionId: revision.id, locale, draftChanged,
          total: figure?.total ?? 0, untranslated: figure ? figure.total - figure.translated - figure.stale : 0, stale: figure?.stale ?? 0,
        }];
      });
    });
  }

  /** Per panel id, per target locale, the drawn document; panels whose draft moved on are left to the source. */
  async documentsFor(revision: Revision, locales: string[]): Promise<Record<number, Record<string, PanelDocJSON>>> {
    const matching = await this.matchingPanels(revision);
    const docs: Record<number, Record<string, PanelDocJSON>> = {};
    for (const locale of locales) {
      const drawn = await this.translations.targetDocuments(revision.storyId, locale);
      for (const panel of drawn.panels) {
        if (matching.has(panel.panelId)) (docs[panel.panelId] ??= {})[locale] = panel.doc;
      }
    }
    return docs;
  }

  /** The revision's panels whose source document the draft still has, unchanged. */
  private async matchingPanels(revision: Revision): Promise<Set<number>> {
    const sourceLocale = revision.snapshot.story.sourceLocale;
    const panels = await this.panels.findAll({ where: { storyId: revision.storyId }, include: [{ model: PanelDocument, where: { locale: sourceLocale } }] });
    const draft = new Map(panels.map((panel) => [panel.id, canonicalJson(panel.documents![0]!.doc)]));
    return new Set(
      revision.snapshot.panels.filter((panel) => draft.get(panel.id) === canonicalJson(panel.docs[sourceLocale])).map((panel) => panel.id),
    );
  }
}
