// Registers ts-hooks.mjs (see there) for `node --import`.
import { register } from 'node:module';

register('./ts-hooks.mjs', import.meta.url);
