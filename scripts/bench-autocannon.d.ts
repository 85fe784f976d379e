// The part of autocannon's programmatic API the bench uses (the package ships no types).
declare module 'autocannon' {
  namespace autocannon {
    interface Request {
      method?: string;
      path?: string;
      headers?: Record<string, string>;
      body?: string;
      setupRequest?: (req: Request, context: Record<string, unknown>) => Request;
      onResponse?: (
        status: number,
        body: string,
        context: Record<string, unknown>,
        headers: Record<string, string>,
      ) => void;
    }
    interface Options {
      url: string;
      connections?: number;
      duration?: number;
      timeout?: number;
      requests?: Request[];
    }
    interface Histogram {
      average: number;
      total: number;
      p50: number;
      p99: number;
    }
    interface Result {
      requests: Histogram;
      latency: Histogram;
      errors: number;
      timeouts: number;
      non2xx: number;
      statusCodeStats?: Record<string, { count: number }>;
    }
  }
  function autocannon(opts: autocannon.Options): Promise<autocannon.Result>;
  export default autocannon;
}
