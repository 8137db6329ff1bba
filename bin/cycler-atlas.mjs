#!/usr/bin/env node
// Entry point of the `cycler-atlas` command: loads the TypeScript CLI through tsx.
import { register } from 'tsx/esm/api';

register();
await import('../generator/cli/main.ts');
