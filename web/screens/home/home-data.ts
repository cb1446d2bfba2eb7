/**
 * What the building list needs from storage and exchange, in one module the list loads
 * after its first render: the storage layer (IndexedDB and the record schema) is the
 * largest part of the app's code, and the "New survey" button must work before it is read.
 */
export { listSurveys } from '../../storage/index.js';
export { createSurveyNow } from './create-survey.js';
export { loadDemoTown } from './demo-town.js';
