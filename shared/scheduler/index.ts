export * from './dates';
export * from './settings';
export * from './ladder';
export * from './stages';
export * from './clearance';
export * from './feasibility';
export * from './sessions';
