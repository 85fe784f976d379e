#!/usr/bin/env node
// Command-line entry (`npx rigwright ...`): runs the TypeScript CLI through tsx.
import { register } from 'tsx/esm/api';

register();
await import('../src/cli.ts');
