/** (not yet built) */
export {};
