/** What a visitor reads on the kiosk, in English: the reference for every other language. */
export const en = {
  attract: {
    touch: 'Touch to begin',
  },
  notPaired: {
    title: 'Stories are on their way',
  },
  pairing: {
    codeLabel: 'Pairing code',
    steps: 'For staff: in the studio, open Stations, then this screen’s station, and enter this code there.',
    renew: 'When the code runs out, a new one appears here by itself.',
    unreachable: 'Cannot reach the server to get a pairing code. Trying again.',
    unpaired: 'This screen was unpaired in the studio. To use it again, pair it with the code below.',
  },
  waiting: {
    body: 'This screen is paired and is waiting for its first release from the studio.',
    refused: 'Release {{release}} was refused: a file did not match the release’s signed list. It is tried again after {{time}}, or at once when a new release is published.',
  },
  menu: {
    title: 'Choose a story',
    panels_one: '{{count}} screen',
    panels_other: '{{count}} screens',
  },
  story: {
    previous: 'Previous',
    next: 'Next',
    allStories: 'All stories',
    position: '{{current}} of {{total}}',
  },
  settings: {
    language: 'Language',
    largeText: 'Larger text',
    highContrast: 'High contrast',
    reducedMotion: 'Less motion',
  },
  idle: {
    title: 'Still there?',
    body_one: 'This screen goes back to the start in {{count}} second.',
    body_other: 'This screen goes back to the start in {{count}} seconds.',
    stay: 'I’m still here',
  },
};

export type KioskMessages = typeof en;
