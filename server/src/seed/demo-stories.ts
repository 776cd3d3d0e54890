import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { PanelDocJSON, PanelNodeJSON } from '@mantlepiece/shared';
import { Exhibit } from '../exhibits/models/exhibit.model.js';
import { MediaService } from '../media/media.service.js';
import { PanelsService } from '../panels/panels.service.js';
import { Story } from '../stories/models/story.model.js';
import { User } from '../users/models/user.model.js';
import { VenueMembership } from '../users/models/venue-membership.model.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { DEMO_GALLERY } from './demo-scenario.js';
import { renderDemoImage, type DemoImageName } from './demo-images.js';

/** Our invented exhibit. Its media licences run past its planned end. */
export const DEMO_EXHIBIT = { name: 'What Moves the Plates?', plannedStart: '2027-03-01', plannedEnd: '2028-02-29' };
const CREDIT = 'Illustration: Basalt Point Earth Science Centre';
const LICENCE_EXPIRES_ON = '2029-12-31';

export const text = (value: string): PanelNodeJSON => ({ type: 'text', text: value });
export const heading = (value: string): PanelNodeJSON => ({ type: 'heading', attrs: { level: 2 }, content: [text(value)] });
export const paragraph = (...content: (string | PanelNodeJSON)[]): PanelNodeJSON => ({
  type: 'paragraph',
  content: content.map((part) => (typeof part === 'string' ? text(part) : part)),
});
const liveValue = (widgetId: string, output: string, digits: number, unit: string): PanelNodeJSON => ({
  type: 'liveValue',
  attrs: { widgetId, output, format: { digits, unit } },
});
/** A widget block; `visitorModelCard` lets visitors open "How do we know?" under it. */
const widget = (widgetType: string, widgetId: string, params: Record<string, unknown>, visitorModelCard = false): PanelNodeJSON => ({
  type: 'widget',
  attrs: { widgetType, widgetId, params, visitorModelCard },
});
/** Stands for the image until the seed knows its library id. */
const IMAGE = (name: DemoImageName): PanelNodeJSON => ({ type: 'panelImage', attrs: { mediaId: `demo-${name}` } });
export const doc = (...content: PanelNodeJSON[]): PanelDocJSON => ({ type: 'doc', content });

interface DemoImage {
  name: DemoImageName;
  filename: string;
  alt: Record<string, string>;
}

const IMAGES: DemoImage[] = [
  {
    name: 'mantleOverturn',
    filename: 'mantle-overturn.png',
    alt: {
      en: 'A slice through the mantle, hot orange at the bottom and cool blue at the top, with two loops of arrows: rock rises in the middle and sinks at the sides.',
      fr: 'Une coupe du manteau, orange et chaude en bas, bleue et froide en haut, avec deux boucles de flèches : la roche monte au milieu et descend sur les côtés.',
      es: 'Un corte del manto, naranja y caliente abajo, azul y frío arriba, con dos bucles de flechas: la roca sube por el centro y baja por los lados.',
    },
  },
  {
    name: 'spreadingRidge',
    filename: 'spreading-ridge.png',
    alt: {
      en: 'An underwater mountain ridge with hot rock at its crest. Arrows show the sea floor moving away on both sides, and a block sits on the slope.',
      fr: 'Une dorsale sous la mer, avec de la roche chaude à son sommet. Des flèches montrent le fond marin qui s’éloigne des deux côtés ; un bloc est posé sur la pente.',
      es: 'Una dorsal bajo el mar con roca caliente en la cima. Las flechas muestran el fondo marino alejándose a ambos lados; un bloque descansa en la ladera.',
    },
  },
  {
    name: 'sinkingSlab',
    filename: 'sinking-slab.png',
    alt: {
      en: 'An ocean plate bending down at a trench and sliding deep into the orange mantle, with arrows showing it pulling the rest of the plate along.',
      fr: 'Une plaque océanique qui plonge dans une fosse et s’enfonce dans le manteau orange ; des flèches montrent qu’elle tire le reste de la plaque.',
      es: 'Una placa oceánica que se dobla en una fosa y se hunde en el manto naranja; las flechas muestran cómo tira del resto de la placa.',
    },
  },
];

/** Ra of the whole mantle is far higher; 30 000 keeps the overturn easy to watch on a kiosk. */
const OVERTURN = { rayleigh: 3e4, aspectRatio: 2, nx: 128, nz: 64, playbackSpeed: 2, colourRamp: 'mantle-heat', overlay: 'streamlines', units: 'non-dimensional' };
/** Steeper than arctan(0.6) ≈ 31°, so the block slides. */
const RIDGE_FLANK = { massKg: 100, angleDeg: 35, staticFriction: 0.6, kineticFriction: 0.5 };
/** Old Pacific floor, by the plate model fitted to measured depths (GDH1, Stein and Stein 1992). */
const OLD_FLOOR = { ageMyr: 100, model: 'plate' };
/** An old plate whose slab reaches the bottom of the upper mantle: the pull is over ten times the push. */
const OLD_SLAB = { ageMyr: 100, slabLengthKm: 700, slabDipDeg: 60 };

const STORIES: { title: string; panels: PanelDocJSON[] }[] = [
  {
    title: 'Why Does Rock Deep Inside Earth Move?',
    panels: [
      doc(
        heading('Hot rock rises'),
        paragraph('Deep under your feet, the rock of the mantle is hot. Over a very long time it can flow, like thick toffee. Heat from the core warms it from below.'),
        IMAGE('mantleOverturn'),
      ),
      doc(
        heading('Watch it turn over'),
        paragraph('This box of rock is heated from below. Warm rock is lighter, so it rises. Cool rock is heavier, so it sinks.'),
        widget('convection-cell', 'overturn', OVERTURN),
        paragraph('Its Rayleigh number is ', liveValue('overturn', 'rayleigh', 2, ''), '. Above about ', liveValue('overturn', 'onsetRayleigh', 3, ''), ', the rock starts to turn over.'),
      ),
      doc(
        heading('A slow conveyor belt'),
        paragraph('The mantle moves only a few centimetres a year, about as fast as your fingernails grow. Over millions of years, that carries whole plates across the globe.'),
      ),
    ],
  },
  {
    title: 'Sliding Off the Ridge',
    panels: [
      doc(
        heading('A mountain range under the sea'),
        paragraph('A long chain of mountains runs along the middle of the oceans. New sea floor forms at its top. As it moves away, it cools, shrinks and sinks lower.'),
        IMAGE('spreadingRidge'),
      ),
      doc(
        heading('When does a block slide?'),
        widget('slope-force', 'ridge-flank', RIDGE_FLANK),
        paragraph('A block starts to slide when its slope is steeper than ', liveValue('ridge-flank', 'criticalAngleDeg', 2, '°'), '. This slope is steeper, so the block slides. Try a gentler slope.'),
      ),
      doc(
        heading('The plate slides too'),
        paragraph('Real ridge slopes are very gentle, and the model here is simplified. But gravity still pulls the plate down and away from the ridge, helping it move.'),
      ),
    ],
  },
  {
    title: 'Sinking Slabs',
    panels: [
      doc(
        heading('Old plates sink'),
        paragraph('Far from the ridge, an ocean plate is old, cold and heavy. At a deep trench it bends down and sinks into the mantle.'),
        IMAGE('sinkingSlab'),
      ),
      doc(
        heading('Old sea floor sits deep'),
        widget('sea-floor-depth', 'old-floor', OLD_FLOOR),
        paragraph('Sea floor this old lies ', liveValue('old-floor', 'depthM', 2, 'm'), ' down. The cold rock under it is ', liveValue('old-floor', 'lithosphereThicknessKm', 2, 'km'), ' thick. Drag to older floor and watch it sink.'),
      ),
      doc(
        heading('The slab pulls its plate'),
        widget('plate-forces', 'old-slab', OLD_SLAB, true),
        paragraph('Here the sinking slab pulls about ', liveValue('old-slab', 'slabToRidgeRatio', 2, ''), ' times as hard as the ridge pushes. Make the slab short and see which wins.'),
      ),
    ],
  },
];

const withImageIds = (panel: PanelDocJSON, ids: Map<string, number>): PanelDocJSON =>
  JSON.parse(JSON.stringify(panel), (key, value: unknown) => (key === 'mediaId' && typeof value === 'string' && ids.has(value) ? String(ids.get(value)) : value)) as PanelDocJSON;

/**
 * The demo exhibit, written for a family audience, built through the same services the studio
 * calls, so every panel passes the server's check and every image goes through the media pipeline.
 */
@Injectable()
export class DemoStories {
  constructor(
    @InjectModel(Gallery) private readonly galleries: typeof Gallery,
    @InjectModel(Exhibit) private readonly exhibits: typeof Exhibit,
    @InjectModel(Story) private readonly stories: typeof Story,
    @InjectModel(User) private readonly users: typeof User,
    private readonly media: MediaService,
    private readonly panels: PanelsService,
  ) {}

  async seed(curatorEmail: string): Promise<void> {
    const gallery = await this.galleries.findOne({ where: { name: DEMO_GALLERY.name } });
    // With their venues, as the guard reads a person: the panels and images go where they write.
    const curator = await this.users.findOne({ where: { email: curatorEmail }, include: [VenueMembership] });
    if (!gallery || !curator) throw new Error('the demo gallery and curator must exist before the demo stories');
    const exhibit = await this.exhibits.create({ ...DEMO_EXHIBIT, galleryId: gallery.id });

    const ids = new Map<string, number>();
    for (const image of IMAGES) {
      const [asset] = await this.media.upload(curator, [{ originalname: image.filename, buffer: await renderDemoImage(image.name) }], gallery.venueId);
      await this.media.updateDetails(asset!.id, { credit: CREDIT, licence: { kind: 'spdx', id: 'CC-BY-4.0' }, licenceExpiresOn: LICENCE_EXPIRES_ON, alt: image.alt }, curator);
      ids.set(`demo-${image.name}`, asset!.id);
    }

    for (const { title, panels } of STORIES) {
      const story = await this.stories.create({ title, audience: 'family', sourceLocale: 'en', state: 'draft', venueId: gallery.venueId, exhibitId: exhibit.id, createdById: curator.id });
      for (const panel of panels) await this.panels.addPanel(story.id, { doc: withImageIds(panel, ids) }, curator);
    }
  }
}
