export { TEXT_PROVIDER, TextProvider, TextProviderError, twilioClient, type SentText } from './text-provider';
export { TextProviderModule } from './texts.module';
