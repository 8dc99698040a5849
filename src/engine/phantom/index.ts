export * from './slabPhantom';
