import { Node as ProseMirrorNode } from '@tiptap/pm/model';
import { describe, expect, it } from 'vitest';
import { examplePanelDoc } from '../panel/example-panel.js';
import { panelSchema } from '../panel/panel-extensions.js';
import { panelText } from '../panel/panel-text.js';
import { commentsOnDraft, documentRange, openThreadCount, panelTextIndex } from './draft-comments.js';
import type { CommentView } from './views.js';

const comment = (changes: Partial<CommentView>): CommentView => ({
  id: 1,
  revisionId: 9,
  panelId: 5,
  range: null,
  body: 'Is this right?',
  author: { id: 2, name: 'Educator' },
  parentId: null,
  resolvedAt: null,
  resolvedBy: null,
  createdAt: '2026-03-02T10:00:00.000Z',
  carriedFromRevisionId: null,
  anchorChanged: null,
  ...changes,
}) as CommentView;

const paragraph = (text: string) => ({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] });

describe('commentsOnDraft', () => {
  it('keeps the open threads of the panel, and follows their words to where the draft has moved them', () => {
    const quote = 'pulled down';
    const onRevision = comment({ id: 1, range: { from: 21, to: 32, quote } });
    const draft = paragraph(`Look: a block on a slope is pulled down.`);
    const [landed] = commentsOnDraft([onRevision], 5, draft, 'en');
    expect(landed).toMatchObject({ changed: false, range: { from: 28, to: 39, quote } });
    expect(panelText(draft).slice(28, 39)).toBe(quote);
  });

  it('says so when the words are gone from the draft', () => {
    const [landed] = commentsOnDraft([comment({ range: { from: 0, to: 4, quote: 'Rock' } })], 5, paragraph('Stone moves.'), 'en');
    expect(landed?.changed).toBe(true);
  });

  it('leaves out replies, resolved threads and other panels, and counts the open threads', () => {
    const comments = [comment({ id: 1 }), comment({ id: 2, parentId: 1 }), comment({ id: 3, resolvedAt: '2026-03-03T00:00:00.000Z' }), comment({ id: 4, panelId: 6 })];
    expect(commentsOnDraft(comments, 5, paragraph('Rock.'), 'en').map(({ comment: { id } }) => id)).toEqual([1]);
    expect(openThreadCount(comments)).toBe(2);
  });
});

describe('panelTextIndex', () => {
  it('spells the same text as panelText, live values and lists included', () => {
    const node = ProseMirrorNode.fromJSON(panelSchema(), examplePanelDoc());
    expect(panelTextIndex(node, 'en').text).toBe(panelText(examplePanelDoc(), { locale: 'en' }));
  });

  it('maps a range of panel text onto the words in the document', () => {
    const node = ProseMirrorNode.fromJSON(panelSchema(), examplePanelDoc());
    const index = panelTextIndex(node, 'en');
    const from = index.text.indexOf('Watch the block');
    const range = documentRange(index, { from, to: from + 'Watch the block'.length, quote: 'Watch the block' });
    expect(range && node.textBetween(range.from, range.to)).toBe('Watch the block');
  });
});
