/**
 * Stand-ins for what the session uses of a browser, shared between "tabs" in one test: a
 * key-value storage with a quota or a refusal, and a BroadcastChannel hub.
 */
import type { KeyValueStorage } from '../../src/state/autosave.ts';
import type { ChannelLike, TabMessage } from '../../src/state/session.ts';

export class MemoryStorage implements KeyValueStorage {
  readonly data = new Map<string, string>();
  /** Characters allowed in total (keys and values), as browsers count the quota. */
  quota = Number.POSITIVE_INFINITY;
  refuse = false;
  getItem(key: string): string | null {
    return this.data.get(key) ?? null;
  }
  setItem(key: string, value: string): void {
    if (this.refuse) throw new DOMException('The operation is insecure.', 'SecurityError');
    let used = key.length + value.length;
    for (const [k, v] of this.data) if (k !== key) used += k.length + v.length;
    if (used > this.quota)
      throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
    this.data.set(key, value);
  }
  removeItem(key: string): void {
    this.data.delete(key);
  }
}

/** Channels that deliver each message to every other channel of the hub, at once. */
export class ChannelHub {
  private channels: ChannelLike[] = [];
  open(): ChannelLike {
    const hub = this;
    const channel: ChannelLike = {
      onmessage: null,
      postMessage(message: TabMessage) {
        for (const other of hub.channels)
          if (other !== channel) other.onmessage?.({ data: message } as MessageEvent<TabMessage>);
      },
      close() {
        hub.channels = hub.channels.filter((c) => c !== channel);
      },
    };
    this.channels.push(channel);
    return channel;
  }
}
