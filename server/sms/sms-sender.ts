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
  const inner = new twilio.RequestClient();
  const httpClient = config.baseUrl
    ? ({
        request: (opts: Parameters<typeof inner.request>[0]) => {
          const url = new URL(opts.uri);
          return inner.request({ ...opts, uri: `${config.baseUrl}${url.pathname}${url.search}` });
        },
      } as unknown as InstanceType<typeof twilio.RequestClient>)
    : undefined;
  const client = twilio(config.accountSid, config.authToken, { httpClient, autoRetry: false });
  return {
    async send(to, body) {
      const message = await client.messages.create({ to, from: config.from, body });
      return { sid: message.sid };
    },
  };
}
