import { panelText } from '../panel/panel-text.js';
import type { SnapshotPanel } from '../review/revision-snapshot.js';
import type { PreflightContext, PreflightFinding, PreflightMedia } from './types.js';

const LABEL_LENGTH = 40;

/** "Panel 2 (“Why does rock slide?”)": its place in the story and its first line, as a curator finds it. */
export function panelName(context: PreflightContext, panel: SnapshotPanel): string {
  const number = context.snapshot.panels.indexOf(panel) + 1;
  const { sourceLocale } = context.snapshot.story;
  const doc = panel.docs[sourceLocale];
  const firstLine = doc ? (panelText(doc, { locale: sourceLocale }).split('\n')[0] ?? '') : '';
  if (!firstLine) return `Panel ${number}`;
  const label = firstLine.length > LABEL_LENGTH ? `${firstLine.slice(0, LABEL_LENGTH - 1).trimEnd()}…` : firstLine;
  return `Panel ${number} (“${label}”)`;
}

/** The English name of a language tag ("French" for fr), or the tag itself when unknown. */
export function languageName(locale: string): string {
  try {
    return new Intl.DisplayNames(['en'], { type: 'language' }).of(locale) ?? locale;
  } catch {
    return locale;
  }
}

export interface PanelInspection {
  /** Plain-language problems found on the panel; none means it passed. */
  problems: string[];
  /** What was checked, said when nothing was wrong. */
  passed: string;
}

/**
 * One finding per problem on each panel the check applies to, a passed finding for each panel it
 * applies to without problems, and one passed finding for the story when it applies to no panel,
 * so every check shows up in the list.
 */
export function panelFindings(
  context: PreflightContext,
  inspect: (panel: SnapshotPanel, name: string) => PanelInspection | null,
  noneApply: string,
): PreflightFinding[] {
  const findings = context.snapshot.panels.flatMap((panel): PreflightFinding[] => {
    const inspection = inspect(panel, panelName(context, panel));
    if (!inspection) return [];
    if (inspection.problems.length === 0) return [{ passed: true, message: inspection.passed, panelId: panel.id }];
    return inspection.problems.map((message) => ({ passed: false, message, panelId: panel.id }));
  });
  return findings.length > 0 ? findings : [{ passed: true, message: noneApply }];
}

export interface PanelImage {
  mediaId: string;
  /** Missing when the asset is no longer in the media library. */
  asset: PreflightMedia | undefined;
  /** How a message names the image: its file name, or its library number. */
  name: string;
}

export function panelImages(context: PreflightContext, panel: SnapshotPanel): PanelImage[] {
  return panel.mediaIds.map((mediaId) => {
    const asset = context.media.find((media) => String(media.id) === mediaId);
    return { mediaId, asset, name: asset?.filename ? `the image “${asset.filename}”` : `image ${mediaId}` };
  });
}

/** A check of each image the library still holds; images missing from it are the library check's to report. */
export function imageFindings(
  context: PreflightContext,
  inspect: (asset: PreflightMedia, image: PanelImage) => string | null,
  passed: (panelName: string) => string,
): PreflightFinding[] {
  return panelFindings(
    context,
    (panel, name) => {
      const images = panelImages(context, panel).filter((image): image is PanelImage & { asset: PreflightMedia } => image.asset !== undefined);
      if (images.length === 0) return null;
      const problems = images.flatMap((image) => {
        const problem = inspect(image.asset, image);
        return problem === null ? [] : [`${name}: ${problem}`];
      });
      return { problems, passed: passed(name) };
    },
    'No panel shows an image from the media library.',
  );
}
