import { Global, Module } from '@nestjs/common';
import { DemoHistory } from './demo-history.js';

/**
 * Global on purpose, and imported right after CqrsModule in AppModule: Nest runs global modules'
 * bootstrap hooks first, in the order they are first imported, so the demo history is written after
 * the command handlers are registered and before the (global) mail module starts its sender.
 */
@Global()
@Module({ providers: [DemoHistory], exports: [DemoHistory] })
export class DemoModule {}
