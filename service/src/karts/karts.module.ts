import { Module } from '@nestjs/common';
import { KartsController } from './karts.controller.js';
import { CreateKartHandler } from './commands/create-kart.handler.js';
import { DeleteKartHandler } from './commands/delete-kart.handler.js';
import { UpdateKartHandler } from './commands/update-kart.handler.js';
import { GetKartHandler } from './queries/get-kart.handler.js';
import { ListKartsHandler } from './queries/list-karts.handler.js';
import { RecordSetupHandler } from './commands/record-setup.handler.js';
import { ListSetupsHandler } from './queries/list-setups.handler.js';

const handlers = [CreateKartHandler, UpdateKartHandler, DeleteKartHandler, GetKartHandler, ListKartsHandler, RecordSetupHandler, ListSetupsHandler];

@Module({ controllers: [KartsController], providers: handlers })
export class KartsModule {}
