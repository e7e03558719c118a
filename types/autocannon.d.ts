/** The slice of autocannon's programmatic API the board benchmark uses (the package ships no types). */
declare module "autocannon" {
  namespace autocannon {
    type Options = { url: string; connections?: number; duration?: number; headers?: Record<string, string> };
    type Result = { requests: { average: number }; throughput: { average: number }; non2xx: number; errors: number };
    type Instance = { on(event: "response", listener: (client: unknown, status: number, bytes: number, ms: number) => void): Instance };
  }
  function autocannon(options: autocannon.Options, done: (err: Error | null, result: autocannon.Result) => void): autocannon.Instance;
  export default autocannon;
}
