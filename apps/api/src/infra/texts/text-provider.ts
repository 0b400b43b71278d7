import type twilio from 'twilio';
import type { RequestOptions } from 'twilio/lib/base/RequestClient';
import type Response from 'twilio/lib/http/response';
import type { AppConfig } from '../../config';

type ProviderConfig = Pick<AppConfig, 'TWILIO_ACCOUNT_SID' | 'TWILIO_AUTH_TOKEN' | 'TWILIO_FROM' | 'TWILIO_API_URL'>;

/** One text as the provider took it. */
export interface SentText {
  sid: string;
  status: string;
}

/** The provider refused or could not be reached; `permanent` when sending the same again cannot help (a 4xx). */
export class TextProviderError extends Error {
  constructor(
    message: string,
    readonly permanent: boolean,
  ) {
    super(message);
  }
}

let loaded: typeof twilio | undefined;
/**
 * The SDK, loaded with the first text or webhook rather than at boot: it is about 25 MB of resident memory
 * (issue 22, `npm run bench` memory rows) that a shop without texts never uses. Synchronous on purpose: the
 * provider is asked from plain methods. The SDK is CommonJS, so require gives the callable module itself.
 */
function sdkModule(): typeof twilio {
  // eslint-disable-next-line @typescript-eslint/no-require-imports -- lazy and synchronous on purpose, see above
  return (loaded ??= require('twilio') as typeof twilio);
}

/**
 * The SDK's documented custom httpClient: its own RequestClient (same auth, form encoding, errors), with
 * each request's origin swapped for the configured one, so the SDK talks to the local fake (or any
 * endpoint that speaks the provider's API) and no code path sends a text without the SDK.
 */
function endpointRequestClient(endpoint: URL): twilio.RequestClient {
  class EndpointRequestClient extends sdkModule().RequestClient {
    constructor() {
      super({ timeout: 15_000 });
    }

    override request<TData>(opts: RequestOptions<TData>): Promise<Response<TData>> {
      const uri = new URL(opts.uri);
      const base = endpoint.pathname.replace(/\/+$/, '');
      const moved = new URL(`${base}${uri.pathname}${uri.search}`, endpoint.origin);
      return super.request<TData>({ ...opts, uri: moved.toString() });
    }
  }
  return new EndpointRequestClient();
}

/** The SDK's client: the provider's own hosts, or the configured endpoint through the custom httpClient. */
export function twilioClient(cfg: ProviderConfig): twilio.Twilio {
  const opts = cfg.TWILIO_API_URL === 'provider' ? {} : { httpClient: endpointRequestClient(new URL(cfg.TWILIO_API_URL)) };
  return sdkModule()(cfg.TWILIO_ACCOUNT_SID, cfg.TWILIO_AUTH_TOKEN, opts);
}

/** Text messages through the provider's own SDK; a real account needs configuration only. */
export class TextProvider {
  private client: twilio.Twilio | undefined;

  constructor(private readonly cfg: ProviderConfig) {}

  private get sdk(): twilio.Twilio {
    return (this.client ??= twilioClient(this.cfg));
  }

  /** Sends one text; the provider reports its fate to `statusCallback` (signed, see `signatureOk`). */
  async send(to: string, body: string, statusCallback: string): Promise<SentText> {
    const from = /^MG[0-9a-f]{32}$/i.test(this.cfg.TWILIO_FROM) ? { messagingServiceSid: this.cfg.TWILIO_FROM } : { from: this.cfg.TWILIO_FROM };
    try {
      const m = await this.sdk.messages.create({ to, body, statusCallback, ...from });
      return { sid: m.sid, status: m.status };
    } catch (e) {
      const status = (e as { status?: number }).status;
      const message = e instanceof Error ? e.message : String(e);
      // 4xx other than 429 (too many requests): the same request will be refused again.
      throw new TextProviderError(message, typeof status === 'number' && status >= 400 && status < 500 && status !== 429);
    }
  }

  /** The provider's webhook signature (X-Twilio-Signature) over the URL it posted to and the form params, checked by the SDK. */
  signatureOk(signature: string | undefined, url: string, params: Record<string, string>): boolean {
    return !!signature && sdkModule().validateRequest(this.cfg.TWILIO_AUTH_TOKEN, signature, url, params);
  }
}

export const TEXT_PROVIDER = Symbol('TEXT_PROVIDER');
