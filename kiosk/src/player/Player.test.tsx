import { act, fireEvent, render, screen, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { vi } from 'vitest';
import '../app/i18n';
import { DEFAULT_CONFIG } from '../app/config';
import type { VisitorEvent } from '../outbox/event-outbox';
import { fixtureRelease, venueKey } from '../test-support/release-fixture';
import type { PlayableRelease } from '../sync/playable-release';
import { endonym } from './language-names';
import { Player } from './Player';

const { manifest } = fixtureRelease(venueKey(), 1, { locales: ['en', 'fr', 'ar', 'he'] });
const release: PlayableRelease = { releaseId: 1, manifest, imageUrls: new Map([['m1', 'blob:kiosk.test/m1']]), dispose: () => undefined };
const config = { ...DEFAULT_CONFIG, idleMs: 60_000, warningMs: 25_000 };

let events: VisitorEvent[];
beforeEach(() => {
  events = [];
  vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout', 'setInterval', 'clearInterval', 'Date'] });
});
afterEach(() => vi.useRealTimers());

function begin() {
  render(<Player release={release} config={config} record={(event) => events.push(event)} />);
  fireEvent.click(screen.getByRole('button', { name: /Touch to begin/ }));
}

const languageButton = (name: string) => within(screen.getByRole('group', { name: /Language|Langue/ })).getByRole('button', { name });

describe('player', () => {
  it('lists each language by its own name, in that language', () => {
    begin();
    const names = within(screen.getByRole('group', { name: 'Language' })).getAllByRole('button').map((button) => [button.textContent, button.getAttribute('lang')]);
    // Endonyms as CLDR gives them through Intl.DisplayNames.
    expect(names).toEqual([['English', 'en'], ['Français', 'fr'], ['العربية', 'ar'], ['עברית', 'he']]);
    expect(endonym('de')).toBe('Deutsch');
  });

  it('opens a story, turns panels with the buttons and by swipe, and records what the visitor did', () => {
    begin();
    fireEvent.click(screen.getByRole('button', { name: /Why rock slides/ }));
    expect(screen.getByRole('heading', { level: 2 }).textContent).toBe('Why rock slides 1');
    expect(screen.getByRole('img').getAttribute('alt')).toBe('A basalt cliff above the sea');
    expect(screen.getByText('Photo: Tomás Reyes')).toBeTruthy();
    act(() => {
      vi.advanceTimersByTime(4_000);
    });
    fireEvent.click(screen.getByRole('button', { name: 'Next' }));
    expect(screen.getByRole('heading', { level: 2 }).textContent).toBe('Why rock slides 2');
    const stage = document.querySelector('.stage')!;
    fireEvent.pointerDown(stage, { clientX: 900, clientY: 500 });
    fireEvent.pointerUp(stage, { clientX: 600, clientY: 520 });
    expect(screen.getByRole('heading', { level: 2 }).textContent).toBe('Why rock slides 3');
    expect(screen.getByText('3 of 3')).toBeTruthy();
    expect(events.slice(0, 2)).toEqual([
      { type: 'story_opened', storyId: 7, locale: 'en' },
      { type: 'panel_viewed', storyId: 7, panelId: 701, locale: 'en', dwellMs: 4_000 },
    ]);
  });

  it('mirrors the story for a right-to-left language and swipes the other way', () => {
    begin();
    fireEvent.click(languageButton('العربية'));
    fireEvent.click(screen.getByRole('button', { name: /Why rock slides \(ar\)/ }));
    expect(document.querySelector('.story')!.getAttribute('dir')).toBe('rtl');
    expect(document.querySelector('.mp-panel')!.getAttribute('dir')).toBe('rtl');
    expect(document.querySelector('.mp-panel')!.getAttribute('lang')).toBe('ar');
    const stage = document.querySelector('.stage')!;
    fireEvent.pointerDown(stage, { clientX: 600, clientY: 500 });
    fireEvent.pointerUp(stage, { clientX: 900, clientY: 500 });
    expect(screen.getByRole('heading', { level: 2 }).textContent).toBe('Why rock slides (ar) 2');
    expect(events[0]).toEqual({ type: 'language_chosen', locale: 'ar' });
  });

  it('warns "Still there?" with a countdown of at least 20 s, and "I’m still here" keeps the visit', () => {
    begin();
    fireEvent.click(languageButton('Français'));
    act(() => {
      vi.advanceTimersByTime(60_000);
    });
    const dialog = screen.getByRole('alertdialog');
    expect(within(dialog).getByRole('heading').textContent).toBe('Vous êtes toujours là ?');
    expect(dialog.textContent).toContain('dans 25 secondes');
    act(() => {
      vi.advanceTimersByTime(5_000);
    });
    expect(dialog.textContent).toContain('dans 20 secondes');
    fireEvent.click(within(dialog).getByRole('button', { name: 'Je suis toujours là' }));
    expect(screen.queryByRole('alertdialog')).toBeNull();
    expect(screen.getByRole('heading', { level: 1 }).textContent).toBe('Choisissez un récit');
  });

  it('resets to the attract loop after the warning, and the next visitor gets the source language and no switches', () => {
    begin();
    fireEvent.click(languageButton('Français'));
    fireEvent.click(screen.getByRole('switch', { name: 'Texte plus grand' }));
    fireEvent.click(screen.getByRole('switch', { name: 'Contraste élevé' }));
    fireEvent.click(screen.getByRole('switch', { name: 'Moins de mouvement' }));
    expect(document.querySelector('.player')!.hasAttribute('data-large-text')).toBe(true);
    act(() => {
      vi.advanceTimersByTime(60_000 + 24_999);
    });
    expect(screen.getByRole('alertdialog')).toBeTruthy();
    act(() => {
      vi.advanceTimersByTime(1);
    });
    expect(screen.queryByRole('alertdialog')).toBeNull();
    expect(screen.getByRole('button', { name: /Touch to begin/ })).toBeTruthy();

    fireEvent.click(screen.getByRole('button', { name: /Touch to begin/ }));
    expect(screen.getByRole('heading', { level: 1 }).textContent).toBe('Choose a story');
    expect(languageButton('English').getAttribute('aria-pressed')).toBe('true');
    expect(screen.getAllByRole('switch').map((item) => item.getAttribute('aria-checked'))).toEqual(['false', 'false', 'false']);
    expect(document.querySelector('.player')!.hasAttribute('data-large-text')).toBe(false);
    expect(events.filter((event) => event.type === 'switch_used').map((event) => event.switch)).toEqual(['large_text', 'high_contrast', 'reduced_motion']);
  });
});
