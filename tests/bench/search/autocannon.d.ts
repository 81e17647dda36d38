// The few parts of autocannon (no types of its own) the search bench uses.
declare module "autocannon" {
  type Result = { requests: { average: number }; errors: number };
  type Instance = PromiseLike<Result> & { on(event: "response", listener: (client: unknown, status: number, bytes: number, ms: number) => void): void };
  export default function autocannon(options: { url: string; connections?: number; duration?: number; amount?: number; timeout?: number }): Instance;
}
