import { describe, expect, it } from 'vitest';
import { errorMessage } from './error-message';

describe('errorMessage', () => {
  it('gives an Error its own message, without the stack', () => {
    expect(errorMessage(new TypeError('disk full'))).toBe('disk full');
  });

  it('gives anything else thrown as text', () => {
    expect(errorMessage('connection reset')).toBe('connection reset');
    expect(errorMessage(42)).toBe('42');
    expect(errorMessage(undefined)).toBe('undefined');
  });
});
