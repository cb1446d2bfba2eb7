/** Damage states and the evidence that maps to them. */
export * from './damage-state.js';
