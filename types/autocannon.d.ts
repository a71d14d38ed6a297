// autocannon ships no types; only what scripts/bench-server.ts uses is declared.
declare module 'autocannon' {
  namespace autocannon {
    interface Request {
      method?: string;
      path?: string;
      headers?: Record<string, string>;
      body?: string;
      setupRequest?: (req: Record<string, unknown>, context: Record<string, unknown>) => Record<string, unknown>;
      onResponse?: (status: number, body: string, context: Record<string, unknown>) => void;
    }
    interface Options {
      url: string;
      connections?: number;
      duration?: number;
      method?: string;
      headers?: Record<string, string>;
      body?: string;
      requests?: Request[];
    }
    interface Histogram {
      average: number;
      p50: number;
      p97_5: number;
      p99: number;
    }
    interface Result {
      requests: Histogram;
      latency: Histogram;
      non2xx: number;
      errors: number;
    }
    interface Instance extends PromiseLike<Result> {
      on(event: 'response', fn: (client: unknown, status: number, bytes: number, ms: number) => void): void;
    }
  }
  function autocannon(opts: autocannon.Options): autocannon.Instance;
  export default autocannon;
}
