import { describe, expect, it } from 'vitest';
import { inkOn } from '../../src/layout/ink.js';

describe('text ink on a filled mark', () => {
  // WCAG 2.x contrast ratio: #1b2025 on #206c89 is about 3.0:1 and #ffffff on it about 5.8:1, so
  // white reads better on the dark blue; on the light yellow #f0e442 dark text wins.
  it('takes the page colour on a dark fill and the dark text colour on a light one', () => {
    expect(inkOn('#206c89', '#1b2025', '#ffffff')).toBe('#ffffff');
    expect(inkOn('#f0e442', '#1b2025', '#ffffff')).toBe('#1b2025');
  });

  it('takes the higher ratio even when both are close: on #767676 black has about 4.6:1, white about 4.5:1 (WCAG 2.x)', () => {
    expect(inkOn('#767676', '#000000', '#ffffff')).toBe('#000000');
  });
});
