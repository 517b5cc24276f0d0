/** Public API of the electrode-kinetics methods. */
export * from './nicholsonPsi';
export * from './nicholsonRateConstant';
export * from './lavironRateConstant';
export * from './irreversibleRateConstant';
export * from './kineticPeakCurrentRatio';
export * from './followUpRateConstant';
export * from './forwardPeakRateConstant';
export * from './correctedIrreversibleRateConstant';
export * from './nicholsonPsiAtAlpha';
export * from './jointFollowUpRateConstant';
export * from './followUpCurrentFunction';
export * from './lavironWorkingCurve';
export * from './followUpPeakWidth';
