import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import cookieParser from 'cookie-parser';
import type { NextFunction, Request, Response } from 'express';
import { AppModule, type AppModuleOptions } from './app.module.js';
import { createValidationPipe } from './common/validation.js';
import { SESSION_COOKIE } from './common/session-user.js';
import type { AppConfig } from './config/app.config.js';

export interface CreateAppOptions extends AppModuleOptions {
  logger?: false;
}

/** Builds the whole application: API under /api, docs at /api/docs, the built UI everywhere else. */
export async function createApp(options: CreateAppOptions = {}): Promise<NestExpressApplication> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot(options), {
    logger: options.logger === false ? false : ['log', 'warn', 'error'],
    bodyParser: true,
  });
  const config = app.get('CONFIGURATION(app)', { strict: false }) as AppConfig | undefined;
  app.setGlobalPrefix('api');
  app.useBodyParser('json', { limit: '256kb' });
  app.use(cookieParser());
  app.useGlobalPipes(createValidationPipe());
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');

  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Fuelwright API')
      .setDescription('Fuel-system and carburettor diagnosis for two-stroke kart engines. JSON over HTTP; sessions are an httpOnly cookie.')
      .setVersion('0.1.0')
      .addCookieAuth(SESSION_COOKIE)
      .build(),
  );
  SwaggerModule.setup('api/docs', app, document, { jsonDocumentUrl: 'api/docs/openapi.json' });

  const uiDist = config?.uiDist;
  if (uiDist && existsSync(join(uiDist, 'index.html'))) serveUi(app, uiDist);
  return app;
}

/** The built single-page UI: files as they are, and index.html for any other non-API GET. */
function serveUi(app: NestExpressApplication, uiDist: string): void {
  app.useStaticAssets(uiDist, { index: false, maxAge: '1h', immutable: false });
  const indexHtml = join(uiDist, 'index.html');
  app.use((req: Request, res: Response, next: NextFunction) => {
    if ((req.method !== 'GET' && req.method !== 'HEAD') || req.path === '/api' || req.path.startsWith('/api/')) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexHtml);
  });
}
