/** The part of autocannon 9 (no types of its own) that bench/api/load.ts uses. */
declare module "autocannon" {
  interface AutocannonRequest {
    method?: string;
    path?: string;
    headers?: Record<string, string>;
    body?: string | Buffer;
    setupRequest?: (request: AutocannonRequest, context: object) => AutocannonRequest;
  }
  interface AutocannonOptions {
    url: string;
    connections?: number;
    duration?: number;
    amount?: number;
    maxOverallRequests?: number;
    timeout?: number;
    headers?: Record<string, string>;
    requests?: AutocannonRequest[];
  }
  interface AutocannonResult {
    errors: number;
    timeouts: number;
    duration: number;
    start: Date;
    finish: Date;
  }
  interface Instance extends PromiseLike<AutocannonResult> {
    on(
      event: "response",
      listener: (client: unknown, statusCode: number, resBytes: number, responseTime: number) => void,
    ): this;
    on(event: "reqError", listener: (error: Error) => void): this;
    stop(): void;
  }
  function autocannon(options: AutocannonOptions): Instance;
  export default autocannon;
}
