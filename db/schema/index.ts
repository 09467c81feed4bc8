export * from './workshops';
export * from './users';
export * from './clients';
export * from './board';
export * from './bench';
