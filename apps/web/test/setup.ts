import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { afterEach } from 'vitest';
import { setAccessToken } from '@/lib/api-client';

// jsdom lacks these layout and pointer APIs that Radix calls.
globalThis.ResizeObserver ??= class {
  observe() {}
  unobserve() {}
  disconnect() {}
};
Element.prototype.hasPointerCapture ??= () => false;
Element.prototype.releasePointerCapture ??= () => {};
Element.prototype.scrollIntoView ??= () => {};
Range.prototype.getBoundingClientRect ??= () => new DOMRect(0, 0, 0, 0);
Range.prototype.getClientRects ??= () =>
  ({ length: 0, item: () => null, [Symbol.iterator]: [][Symbol.iterator] }) as DOMRectList;
document.elementFromPoint ??= () => null;

// Lazy routes load their module on first use (the claim page's pulls in several
// features); on a busy two-core machine with other suites running that can pass 3 s.
configure({ asyncUtilTimeout: 10_000 });

afterEach(() => {
  cleanup();
  setAccessToken(null);
});
