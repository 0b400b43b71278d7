export { TextsModule } from './texts.module';
export { TextsService, type TextQueued, type TextRequest } from './texts.service';
export type { TextKind } from './text-bodies';
