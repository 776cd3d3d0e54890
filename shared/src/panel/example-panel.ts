import type { PanelDocJSON } from './panel-json.js';

/** A new panel: one empty paragraph, the smallest document the schema accepts. */
export const emptyPanelDoc = (): PanelDocJSON => ({ type: 'doc', content: [{ type: 'paragraph' }] });

/**
 * A panel using every node and mark a panel can hold, for tests here and in the apps (translation
 * segmentation, preview, preflight). Written for a family audience, like the demo stories.
 */
export const examplePanelDoc = (): PanelDocJSON => ({
  type: 'doc',
  content: [
    { type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: 'Why does rock slide?' }] },
    {
      type: 'paragraph',
      content: [
        { type: 'text', text: 'A block on a slope is pulled ' },
        { type: 'text', text: 'down', marks: [{ type: 'bold' }] },
        { type: 'text', text: ' and pressed ' },
        { type: 'text', text: 'into', marks: [{ type: 'italic' }] },
        { type: 'text', text: ' the rock. It starts to slide above ' },
        { type: 'liveValue', attrs: { widgetId: 'ridge-slope', output: 'criticalAngleDeg', format: { digits: 2, unit: '°' } } },
        { type: 'text', text: '.' },
        { type: 'hardBreak' },
        { type: 'text', text: 'Read more at ' },
        { type: 'text', text: 'our website', marks: [{ type: 'link', attrs: { href: 'https://basalt-point.example/slopes' } }] },
        { type: 'text', text: '.' },
      ],
    },
    {
      type: 'widget',
      attrs: { widgetType: 'slope-force', widgetId: 'ridge-slope', params: { massKg: 10, angleDeg: 30, staticFriction: 0.85, kineticFriction: 0.6 }, visitorModelCard: false },
    },
    { type: 'heading', attrs: { level: 3 }, content: [{ type: 'text', text: 'Try it' }] },
    {
      type: 'bulletList',
      content: [
        { type: 'listItem', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Tilt the slope.' }] }] },
        { type: 'listItem', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Watch the block.' }] }] },
      ],
    },
    {
      type: 'orderedList',
      attrs: { start: 1, type: null },
      content: [{ type: 'listItem', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Ask a guide.' }] }] }],
    },
    { type: 'blockquote', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Rock holds until it does not.' }] }] },
    { type: 'panelImage', attrs: { mediaId: 'ridge-photo' } },
  ],
});
