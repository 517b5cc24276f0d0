/** Public API of the reference-scale conversions. */
export * from './referenceElectrodes';
export * from './convertPotential';
export * from './referenceOffset';
export * from './referenceTemperature';
export * from './referenceName';
export * from './referenceCautions';
export * from './hgOxideElectrode';
