/** The screening verdict: posting levels (the `screen()` function arrives with its issue). */
export * from './posting-level.js';
