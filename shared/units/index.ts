/** Lengths: mm ⇄ in/cm, fraction formatting and parsing (all lengths stored in mm). */
export * from './units';
export * from './format';
export * from './parse';
export * from './length-schema';
