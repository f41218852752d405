#!/usr/bin/env node
// The `couplet` command. Runs the TypeScript sources directly through tsx (a dependency), so it
// works right after `npm install` with no build step.
import { register } from 'tsx/esm/api';

register();
await import('../src/cli/main.ts');
