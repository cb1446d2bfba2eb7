/**
 * The app's URL paths. Every one of them opens offline: the service worker answers any
 * navigation with the app shell, and the router picks the screen.
 */
export const paths = {
  home: '/',
  survey: (id: string, step?: string) => (step ? `/survey/${id}/${step}` : `/survey/${id}`),
  result: (id: string) => `/survey/${id}/result`,
  map: '/map',
  settings: '/settings',
} as const;
