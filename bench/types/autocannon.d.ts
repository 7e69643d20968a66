// The parts of autocannon 9 the benches and the load run use (the package ships no types).
declare module 'autocannon' {
  interface RequestSpec {
    method?: string;
    path?: string;
    body?: string;
    headers?: Record<string, string>;
  }
  interface Request extends RequestSpec {
    /** Called before each send; returns the request to send (e.g. with a fresh body). */
    setupRequest?: (request: RequestSpec) => RequestSpec;
    /** Called with each answer. */
    onResponse?: (status: number, body: string) => void;
  }
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    headers?: Record<string, string>;
    requests?: Request[];
  }
  interface Histogram { average: number; p50: number; p99: number; total: number }
  interface Result { requests: Histogram; latency: Histogram; non2xx: number; errors: number; timeouts: number; duration: number }
  function autocannon(options: Options): Promise<Result>;
  export default autocannon;
}
