/**
 * Acceleration of gravity used throughout, in m/s². 9.81 is the rounded value the
 * structural codes' worked examples use (EN 1998-1 and ASCE 7 examples, common practice);
 * standard gravity is 9.80665 (CGPM 1901). The difference is 0.03 %.
 */
export const G = 9.81;
