import { Module } from '@nestjs/common';
import { ConditionsController } from './conditions.controller.js';
import { ComputeAirHandler } from './queries/compute-air.handler.js';

const handlers = [ComputeAirHandler];

@Module({ controllers: [ConditionsController], providers: handlers })
export class ConditionsModule {}
