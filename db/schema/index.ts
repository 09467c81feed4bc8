export * from './workshops';
export * from './users';
