/** What component tests under jsdom need around ant-design-vue and the API client. */

/** jsdom lacks matchMedia; ant-design-vue's responsive helpers call it. */
export function stubMatchMedia(): void {
  window.matchMedia ??= ((query: string) => ({
    matches: false,
    media: query,
    onchange: null,
    addListener: () => undefined,
    removeListener: () => undefined,
    addEventListener: () => undefined,
    removeEventListener: () => undefined,
    dispatchEvent: () => false,
  })) as unknown as typeof window.matchMedia;
}

/** A fetch Response with a JSON body, as the server sends it. */
export const json = (status: number, body: unknown): Response =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
