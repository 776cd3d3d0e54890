/** What a visitor reads on the kiosk, in English: the reference for every other language. */
export const en = {
  attract: {
    touch: 'Touch to begin',
  },
  notPaired: {
    title: 'Stories are on their way',
    body: 'This screen is not yet paired with a station, so it has no stories to show yet.',
    staff: 'For staff: pair this kiosk with a station from the studio.',
    back: 'Back',
  },
  offline: {
    title: 'This screen cannot reach its server',
    body: 'It tries again by itself every half minute.',
  },
};

export type KioskMessages = typeof en;
