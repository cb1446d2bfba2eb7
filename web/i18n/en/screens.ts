/** English text of the screens: building list, survey steps, result, settings. */
export const screens = {
  'home.title': 'Buildings',
  'home.empty': 'No buildings surveyed on this device yet.',
  'home.loadDemo': 'Load demo town',
  'settings.checkUpdate': 'Check for a new version',
  'settings.build': 'Build {build}',
} as const;
