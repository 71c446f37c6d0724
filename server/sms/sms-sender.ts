import twilio from 'twilio';

export interface SmsSender {
  send(to: string, body: string): Promise<{ sid: string }>;
}

export interface SmsConfig {
  accountSid: string;
  authToken: string;
  from: string;
  /** Base URL of a local fake; requests keep their path and query but go there instead. */
  baseUrl?: string;
}

/**
 * SMS through the official Twilio SDK. Its region/edge options only change the host name, so a local fake is
 * reached with the SDK's supported hook: a custom HTTP client that rewrites each request's origin.
 */
export function createSmsSender(config: SmsConfig): SmsSender {
  // Explicit: a send job waits at most this long for the provider, then the message is retried later.
  const inner = new twilio.RequestClient({ timeout: 15_000 });
  const httpClient = config.baseUrl
    ? ({
        request: (opts: Parameters<typeof inner.request>[0]) => {
          const url = new URL(opts.uri);
          return inner.request({ ...opts, uri: `${config.baseUrl}${url.pathname}${url.search}` });
        },
      } as unknown as InstanceType<typeof twilio.RequestClient>)
    : undefined;
  const client = twilio(config.accountSid, config.authToken, { httpClient: httpClient ?? inner, autoRetry: false });
  return {
    async send(to, body) {
      const message = await client.messages.create({ to, from: config.from, body });
      return { sid: message.sid };
    },
  };
}
