export * from './users';
export * from './audit';
export * from './mail';
export * from './fluids';
export * from './layer-checks';
export * from './beyond-onset';
export * from './sheets';
export * from './gauge-log';
