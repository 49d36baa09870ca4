// Worker entry when the API runs from its TypeScript sources (ts-jest, tsx): the built app
// loads work-pool.worker.js beside its compiled service instead.
/* global require, module */
/* eslint-disable @typescript-eslint/no-require-imports */
require('tsx/cjs');
module.exports = require('./work-pool.worker.ts');
