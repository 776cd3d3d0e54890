import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { examplePanelDoc } from '../../panel/example-panel.js';
import type { PanelDocJSON } from '../../panel/panel-json.js';
import { PanelFrame } from './PanelFrame.js';
import type { ResolveMedia } from './panel-media.js';
import { PanelView } from './PanelView.js';

const resolveMedia: ResolveMedia = (mediaId) =>
  mediaId === 'ridge-photo'
    ? { src: '/media/ridge-640.webp', srcSet: '/media/ridge-640.webp 640w, /media/ridge-1280.webp 1280w', alt: 'A block of basalt on a tilted slab', credit: 'Photo: Basalt Point Earth Science Centre' }
    : null;

const render = (doc: PanelDocJSON, props: Partial<Parameters<typeof PanelView>[0]> = {}) =>
  renderToStaticMarkup(<PanelView doc={doc} locale="en" resolveMedia={resolveMedia} {...props} />);

/** Every attribute name in the markup, so a test can prove no event handler slipped through. */
const attributeNames = (html: string) =>
  [...html.matchAll(/<[a-zA-Z][^>]*>/g)].flatMap(([tag]) => [...tag.matchAll(/\s([a-zA-Z-:]+)=/g)].map((match) => match[1]?.toLowerCase()));

describe('PanelView', () => {
  const html = render(examplePanelDoc());

  it('draws headings, paragraphs, lists and quotes as their HTML elements', () => {
    expect(html).toMatch(/<h2[^>]*>Why does rock slide\?<\/h2>/);
    expect(html).toMatch(/<h3[^>]*>Try it<\/h3>/);
    expect(html).toContain('<ul><li><p>Tilt the slope.</p></li>');
    expect(html).toContain('<ol start="1"><li><p>Ask a guide.</p></li></ol>');
    expect(html).toContain('<blockquote><p>Rock holds until it does not.</p></blockquote>');
    expect(html).toContain('<br/>');
  });

  it('draws bold, italic and links', () => {
    expect(html).toContain('<strong>down</strong>');
    expect(html).toContain('<em>into</em>');
    expect(html).toMatch(/<a href="https:\/\/basalt-point.example\/slopes" target="_blank" rel="noopener noreferrer nofollow"[^>]*>our website<\/a>/);
  });

  it('draws links as plain text on a kiosk', () => {
    const kiosk = render(examplePanelDoc(), { links: 'text' });
    expect(kiosk).not.toContain('<a ');
    expect(kiosk).toMatch(/<span class="mp-link"[^>]*>our website<\/span>/);
  });

  it('shows a live value computed by the widget, in the panel\'s locale', () => {
    // θc = arctan 0.85 = 40.36°, to 2 significant digits 40°.
    expect(html).toMatch(/<span class="mp-live-value"[^>]*data-widget-id="ridge-slope"[^>]*>40°<\/span>/);
    const doc = examplePanelDoc();
    const live = doc.content?.[1]?.content?.[5];
    if (live?.attrs) live.attrs.format = { digits: 4, unit: '°' };
    expect(render(doc, { locale: 'fr' })).toMatch(/>40,36°<\/span>/);
  });

  it('shows a dash for a live value whose widget is gone', () => {
    const doc = examplePanelDoc();
    doc.content?.splice(2, 1);
    expect(render(doc)).toMatch(/<span class="mp-live-value"[^>]*>—<\/span>/);
  });

  it('draws a widget block with the shared widget component', () => {
    expect(html).toMatch(/<div[^>]*class="mp-widget" data-widget-type="slope-force"><figure class="mp-slope-force-box"/);
    expect(html).toContain('role="slider"');
  });

  it('draws a widget whose params fail validation as a visible problem, not a simulation', () => {
    const doc: PanelDocJSON = { type: 'doc', content: [{ type: 'widget', attrs: { widgetType: 'slope-force', widgetId: 'w1', params: { massKg: -1 } } }] };
    const out = render(doc);
    expect(out).toContain('data-widget-problem="invalid-params"');
    expect(out).not.toContain('mp-slope-force-box');
  });

  it('draws images from the app\'s media with alt text and credit, and nothing for unknown media', () => {
    expect(html).toContain('src="/media/ridge-640.webp"');
    expect(html).toContain('alt="A block of basalt on a tilted slab"');
    expect(html).toContain('<figcaption style="font-size:0.6em;opacity:0.85">Photo: Basalt Point Earth Science Centre</figcaption>');
    const doc: PanelDocJSON = { type: 'doc', content: [{ type: 'panelImage', attrs: { mediaId: 'gone' } }] };
    expect(render(doc)).not.toContain('<img');
  });

  it('sets language, direction, layout size and the visitor\'s switches on the panel', () => {
    expect(html).toMatch(/<article class="mp-panel" lang="en" dir="ltr" data-layout="landscape" style="[^"]*width:1920px;height:1080px/);
    const arabic = render(examplePanelDoc(), { locale: 'ar', layout: 'portrait', largeText: true, highContrast: true, reducedMotion: true });
    expect(arabic).toMatch(/lang="ar" dir="rtl" data-layout="portrait" data-large-text="true" data-high-contrast="true" data-reduced-motion="true"/);
    expect(arabic).toMatch(/width:1080px;height:1920px/);
    expect(arabic).toContain('background:#000000');
  });

  it('never emits a script element, an event handler or an unsafe URL, whatever the document holds', () => {
    const hostile = {
      type: 'doc',
      content: [
        { type: 'script', content: [{ type: 'text', text: 'alert(1)' }] },
        { type: 'paragraph', attrs: { onclick: 'alert(1)' }, content: [{ type: 'text', text: '<script>alert(1)</script><img src=x onerror=alert(1)>' }] },
        { type: 'paragraph', content: [{ type: 'text', text: 'tap', marks: [{ type: 'link', attrs: { href: 'javascript:alert(1)' } }, { type: 'link', attrs: { href: 'data:text/html,<script>alert(1)</script>' } }] }] },
        { type: 'panelImage', attrs: { mediaId: 'ridge-photo', src: 'javascript:alert(1)', onload: 'alert(1)' } },
        { type: 'iframe', attrs: { src: 'https://evil.example' } },
      ],
    } as PanelDocJSON;
    const out = render(hostile);
    expect(out).not.toMatch(/<script|<iframe|<img[^>]*onerror/i);
    expect(attributeNames(out).filter((name) => name?.startsWith('on'))).toEqual([]);
    expect(out).not.toMatch(/href="(javascript|data):/i);
    expect(out).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
  });
});

describe('PanelFrame', () => {
  it('scales a landscape panel to fit a preview box', () => {
    const out = renderToStaticMarkup(
      <PanelFrame layout="landscape" maxWidth={960} maxHeight={2000}>
        <p>panel</p>
      </PanelFrame>,
    );
    expect(out).toContain('width:960px;height:540px');
    expect(out).toContain('transform:scale(0.5)');
  });

  it('scales a portrait panel by its height when the box is short', () => {
    const out = renderToStaticMarkup(
      <PanelFrame layout="portrait" maxWidth={1000} maxHeight={480}>
        <p>panel</p>
      </PanelFrame>,
    );
    expect(out).toContain('width:270px;height:480px');
    expect(out).toContain('transform:scale(0.25)');
  });
});
