/** English strings of the editor's review comments and live phrases, spread into `en`. */
export const editorReviewEn = {
  draftComments: {
    tab: 'Comments ({{open}})',
    title: 'Open review comments',
    summary: 'Open on this panel: {{panel}}. Open in the story: {{story}}. From revision {{number}}.',
    none: 'No open comments on this panel.',
    noRevision: 'This story has not been sent for review yet, so it has no comments.',
    loadError: 'The review comments could not be loaded.',
  },
  livePhrase: {
    menu: 'Live phrase',
    title: 'Live phrase',
    intro: 'Words that follow the {{widget}}: the kiosk shows the wording for the state it is in, and switches when a visitor changes it.',
    wordingFor: 'Wording while it {{state}}',
    noWidget: 'Its widget is no longer on this panel, or has no states to follow. Remove the phrase, or add the widget back.',
  },
  widgetTrial: {
    trying: 'Trying it out: the saved setting is unchanged. Live values in the text show the trial, outlined in dashes.',
    keep: 'Use this as the starting setting',
    reset: 'Back to the saved setting',
    trialValue: 'Shows the widget being tried, not its saved setting.',
  },
  stationPreview: {
    open: 'Full size',
    title: 'Panel {{number}} at full size',
    screen: 'Station screen',
    screenSize: '{{width}} × {{height}} {{orientation}}',
    screenStations: '{{width}} × {{height}} {{orientation}} · {{stations}}',
    landscape: 'landscape',
    portrait: 'portrait',
    fit: 'Zoom to fit',
    actual: 'Actual size',
    zoom: 'Shown at {{percent}} % of the station’s size',
    selected: 'Selected for a comment: “{{quote}}”',
    commentOnSelection: 'Write the comment',
  },
};
