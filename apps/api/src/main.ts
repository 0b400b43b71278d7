import './threadpool';
import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { createApp } from './app.factory';
import { loadConfig } from './config';

async function bootstrap(): Promise<void> {
  const cfg = loadConfig();
  const app = await createApp(cfg);
  await app.listen(cfg.PORT, '0.0.0.0');
  new Logger('BenchProof').log(`Serving web and API on http://localhost:${cfg.PORT}`);
}

void bootstrap();
