import { Module } from '@nestjs/common';
import { PreferencesController } from './preferences.controller.js';
import { GetPreferencesHandler } from './queries/get-preferences.handler.js';
import { SavePreferencesHandler } from './commands/save-preferences.handler.js';

const handlers = [GetPreferencesHandler, SavePreferencesHandler];

@Module({ controllers: [PreferencesController], providers: handlers })
export class PreferencesModule {}
