export * from './errors';
export * from './schemas/common';
export * from './schemas/auth';
export * from './schemas/team';
export * from './domain/index';
