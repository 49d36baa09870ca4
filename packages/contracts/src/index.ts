export * from './common.js';
export * from './auth.js';
export * from './events.js';
export * from './profile.js';
export * from './analysis.js';
export * from './resuscitations.js';
export * from './monitor.js';
export * from './quality.js';
