/** Types for text-fake.mjs (plain JS so it runs with no build). */
export interface FakeText {
  sid: string;
  account_sid: string;
  to: string;
  from: string;
  body: string;
  status: 'queued' | 'sent' | 'delivered' | 'undelivered' | 'failed';
  date_created: string;
  status_callback: string | null;
}

export interface FakePost {
  url: string | null;
  params: Record<string, string>;
  status: number | null;
  error: string | null;
}

export interface TextFake {
  port: number;
  url: string;
  messages(): FakeText[];
  requests(): { method: string; path: string; params: Record<string, string> }[];
  callbacks(): FakePost[];
  replies(): FakePost[];
  setInboundUrl(url: string): void;
  failNext(count?: number, status?: number, code?: number, message?: string): void;
  reply(from: string, body: string): Promise<FakePost>;
  statusCallback(sid: string, status: string): Promise<FakePost | null>;
  close(): Promise<void>;
}

export function signRequest(authToken: string, url: string, params: Record<string, string>): string;
export function startTextFake(opts?: {
  port?: number;
  host?: string;
  accountSid?: string;
  authToken?: string;
  inboundUrl?: string;
  callbackDelayMs?: number;
}): Promise<TextFake>;
