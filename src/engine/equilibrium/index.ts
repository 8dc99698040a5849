export * from './warning';
export * from './lateralRange';
export * from './beamQuality';
export * from './depthBands';
export * from './extrapolationRules';
export * from './equilibriumWarnings';
export * from './methodFlags';
