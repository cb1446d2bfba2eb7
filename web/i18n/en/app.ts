/** English text of the app shell: navigation, update notice, cautions, generic states. */
export const app = {
  'app.name': 'Grainline',
  'app.tagline': 'Timber building screening',
  'nav.label': 'Main',
  'nav.buildings': 'Buildings',
  'nav.newSurvey': 'New survey',
  'nav.map': 'Map',
  'nav.settings': 'Settings',
  'update.ready': 'A new version of Grainline is ready.',
  'update.apply': 'Update now',
  'update.later': 'Later',
  'update.saving': 'Saving your work before updating…',
  'update.flushFailed':
    'Update paused: your latest change could not be saved yet. Check the save status, then try again.',
  'offline.ready': 'Grainline is ready to work offline.',
  'offline.now': 'Offline — everything you enter is kept on this device.',
  'caution.title': 'Screening estimate only',
  'caution.body':
    'These results are screening estimates. They are not a substitute for evaluation by a licensed engineer. Follow local codes and the posting rules of your jurisdiction. Never enter a building that looks unsafe.',
  'notFound.title': 'Page not found',
  'notFound.body': 'This address is not part of Grainline.',
  'notFound.home': 'Go to the building list',
  loading: 'Loading…',
  'error.screen': 'This screen failed to load. Your saved records are not affected.',
  'error.retry': 'Try again',
} as const;
