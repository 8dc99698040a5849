export * from './materialLibrary';
export * from './photonCoefficients';
export * from './electronStopping';
