/** Public API of the sign-convention and iR-correction helpers. */
export * from './currentConvention';
export * from './iRCorrect';
