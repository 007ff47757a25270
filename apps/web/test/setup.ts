import '@testing-library/jest-dom/vitest';
import { cleanup } from '@testing-library/react';
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

afterEach(() => {
  cleanup();
  setAccessToken(null);
});
