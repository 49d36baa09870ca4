/* global require, process */
/**
 * Runs the tablet's own offline debrief (web code) on a `LocalRecord` read as JSON from
 * stdin, and prints the debrief as JSON. Started by the agreement test with tsx, which
 * compiles the web's TypeScript on the fly.
 */
/* eslint-disable @typescript-eslint/no-require-imports -- a CommonJS runner, on purpose */
const { readFileSync } = require('node:fs');
const { debriefFromLocal } = require('../../web/src/features/debrief/api/offline-debrief.ts');

process.stdout.write(JSON.stringify(debriefFromLocal(JSON.parse(readFileSync(0, 'utf8')))));
