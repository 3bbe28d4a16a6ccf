// Boots the Vialyard client.
import { bootstrapApplication } from '@angular/platform-browser';
// Only zod's core settings: the schemas themselves load with the pages that use them.
import { config as zodConfig } from 'zod/v4/core';
import { App } from './app/app';
import { appConfig } from './app/app.config';

// zod 4 probes for eval to speed up parsing; our Content-Security-Policy forbids eval, so tell it not to try.
zodConfig({ jitless: true });

bootstrapApplication(App, appConfig).catch((error: unknown) => console.error(error));
