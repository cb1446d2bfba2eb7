/**
 * The app shell: router, bottom navigation and the update notice. Screens other than the
 * building list load lazily, so the first load stays small; the service worker precaches
 * them all, so they still open offline.
 */
import { ErrorBoundary, LocationProvider, Route, Router, lazy } from 'preact-iso';
import { HomeScreen } from '../screens/home/home-screen.js';
import { NavBar } from './nav-bar.js';
import { NotFoundScreen } from './not-found-screen.js';
import { UpdateNotice } from './update-notice.js';
import { DeferredStorageNotices } from './deferred-storage-notices.js';

// Route table. Each screen module is owned by its area; the shell only maps paths to them.
const SettingsScreen = lazy(() =>
  import('../screens/settings/settings-screen.js').then((m) => m.SettingsScreen),
);
const SurveyScreen = lazy(() =>
  import('../screens/survey/survey-screen.js').then((m) => m.SurveyScreen),
);
const MapScreen = lazy(() => import('../map/map-screen.js').then((m) => m.MapScreen));

export function App() {
  return (
    <LocationProvider>
      <div class="app">
        <DeferredStorageNotices />
        <ErrorBoundary>
          <Router>
            <Route path="/" component={HomeScreen} />
            <Route path="/survey/:id/:step?" component={SurveyScreen} />
            <Route path="/map" component={MapScreen} />
            <Route path="/settings" component={SettingsScreen} />
            <Route default component={NotFoundScreen} />
          </Router>
        </ErrorBoundary>
        <UpdateNotice />
        <NavBar />
      </div>
    </LocationProvider>
  );
}
