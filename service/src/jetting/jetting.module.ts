import { Module } from '@nestjs/common';
import { JettingController } from './jetting.controller.js';
import { AirDensityBaseline } from './air-density-baseline.js';
import { LogSessionHandler } from './commands/log-session.handler.js';
import { DeleteSessionHandler } from './commands/delete-session.handler.js';
import { SaveJetKitHandler } from './commands/save-jet-kit.handler.js';
import { ListSessionsHandler } from './queries/list-sessions.handler.js';
import { GetJetKitHandler } from './queries/get-jet-kit.handler.js';
import { SuggestJetsHandler } from './queries/suggest-jets.handler.js';

const handlers = [LogSessionHandler, DeleteSessionHandler, SaveJetKitHandler, ListSessionsHandler, GetJetKitHandler, SuggestJetsHandler];

/**
 * Jetting log, jet kit and jet suggestion per kart. Exports AirDensityBaseline for the diagnosis
 * (import JettingModule, inject AirDensityBaseline).
 */
@Module({ controllers: [JettingController], providers: [...handlers, AirDensityBaseline], exports: [AirDensityBaseline] })
export class JettingModule {}
