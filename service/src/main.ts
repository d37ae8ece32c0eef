import 'reflect-metadata';
import { existsSync } from 'node:fs';
import { Logger } from '@nestjs/common';
import { createApp } from './app.factory.js';
import { ConfigError, loadAppConfig } from './config/app.config.js';

async function main(): Promise<void> {
  // A .env file in the working folder fills in what the environment does not set (see .env.example).
  if (existsSync('.env')) process.loadEnvFile('.env');
  let config;
  try {
    config = loadAppConfig(process.env);
  } catch (e) {
    if (e instanceof ConfigError) {
      console.error(`Configuration error: ${e.message}`);
      process.exit(1);
    }
    throw e;
  }
  const app = await createApp();
  app.enableShutdownHooks();
  await app.listen(config.port, config.host);
  new Logger('Fuelwright').log(`Serving on http://${config.host === '0.0.0.0' ? 'localhost' : config.host}:${config.port} (API docs at /api/docs)`);
}

void main();
