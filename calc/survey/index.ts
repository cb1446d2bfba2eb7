/** The shape of the survey data the calculation reads (types only). */
export type * from './survey-input.js';
