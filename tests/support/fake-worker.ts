// Stands in for a Web Worker in unit tests: records what it was sent, and replies, fails or stays
// silent when the test says so.
export class FakeWorker<Sent = unknown, Reply = unknown> {
  sent: Sent[] = [];
  terminated = false;
  onmessage: ((event: MessageEvent<Reply>) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  postMessage(message: Sent) {
    this.sent.push(message);
  }
  terminate() {
    this.terminated = true;
  }
  reply(reply: Reply) {
    this.onmessage?.({ data: reply } as MessageEvent<Reply>);
  }
  crash() {
    this.onerror?.({ preventDefault() {} } as unknown as ErrorEvent);
  }
}

/** A factory that makes fake workers and keeps them, newest last. */
export function fakeWorkers<Sent = unknown, Reply = unknown>() {
  const made: FakeWorker<Sent, Reply>[] = [];
  const create = () => {
    const w = new FakeWorker<Sent, Reply>();
    made.push(w);
    return w as unknown as Worker;
  };
  return { made, create };
}
