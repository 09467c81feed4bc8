export * from './workshops';
export * from './users';
export * from './clients';
export * from './board';
export * from './bench';
export * from './costing';
export * from './parts';
export * from './estimates';
