/**
 * Server-sent events as reactive state: the latest parsed message, whether the stream is open, and the last error.
 * The stream closes itself when `isFinal(message)` says so (for example a sweep that is done), when the
 * caller calls `close()`, or when the owning component unmounts.
 */
import { getCurrentScope, onScopeDispose, ref, shallowRef, type Ref, type ShallowRef } from 'vue';

export interface SseOptions<T> {
  /** Event name to listen for; default 'message' (events without an `event:` line). */
  event?: string;
  parse?: (data: string) => T;
  isFinal?: (message: T) => boolean;
  /** Injected in tests; the browser's EventSource otherwise. */
  factory?: (url: string) => EventSource;
}

export interface SseHandle<T> {
  latest: ShallowRef<T | null>;
  open: Ref<boolean>;
  error: Ref<string | null>;
  connect: (url: string) => void;
  close: () => void;
}

export function useSse<T>(options: SseOptions<T> = {}): SseHandle<T> {
  const latest = shallowRef<T | null>(null);
  const open = ref(false);
  const error = ref<string | null>(null);
  const parse = options.parse ?? ((d: string) => JSON.parse(d) as T);
  const factory = options.factory ?? ((url: string) => new EventSource(url, { withCredentials: true }));
  let source: EventSource | null = null;

  function close(): void {
    source?.close();
    source = null;
    open.value = false;
  }

  function connect(url: string): void {
    close();
    error.value = null;
    const es = factory(url);
    source = es;
    open.value = true;
    es.addEventListener(options.event ?? 'message', (ev) => {
      try {
        const msg = parse((ev as MessageEvent<string>).data);
        latest.value = msg;
        if (options.isFinal?.(msg)) close();
      } catch {
        error.value = 'The progress stream sent something unreadable.';
      }
    });
    es.onerror = () => {
      // EventSource retries by itself while CONNECTING; CLOSED means the server will not answer again.
      if (es.readyState === 2) {
        error.value = 'Lost the progress stream; reload to reconnect.';
        if (source === es) close();
      }
    };
  }

  if (getCurrentScope()) onScopeDispose(close);
  return { latest, open, error, connect, close };
}
