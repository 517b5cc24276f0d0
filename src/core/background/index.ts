/** Public API of background subtraction. */
export * from './subtractBlank';
export * from './nearestBlank';
