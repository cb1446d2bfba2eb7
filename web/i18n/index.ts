/** The message catalogue and its lookup: all UI text goes through `t()`. */
export { t, setCatalogue } from './translate.js';
export { en, type MessageKey, type Catalogue } from './catalogue.js';
