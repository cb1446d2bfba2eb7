/** Entry point: styles, the app shell, and the service worker. */
import { render } from 'preact';
import './styles/base.css';
import './styles/print.css';
import { App } from './app/app.js';
import { registerServiceWorker } from './app/service-worker.js';
import { applyDisplayPreferences } from './app/display-preferences.js';

applyDisplayPreferences();
const root = document.getElementById('app');
if (!root) throw new Error('index.html has no #app element');
render(<App />, root);
registerServiceWorker();
