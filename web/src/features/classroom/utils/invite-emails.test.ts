import { describe, expect, it } from 'vitest';
import { parseEmails, validateEmails } from './invite-emails';

describe('addresses pasted into the invitation box', () => {
  it('splits lines, commas, semicolons and spaces, and drops repeats whatever their case', () => {
    expect(parseEmails('theo@example.test, amara@example.test;\nDEV@example.test  dev@example.test')).toEqual({
      emails: ['theo@example.test', 'amara@example.test', 'DEV@example.test'],
      invalid: [],
    });
  });

  it('keeps the address of "Name <address>" as a mail program copies it', () => {
    expect(parseEmails('Theo Park <theo@example.test>, Amara Quist <amara@example.test>').emails).toEqual([
      'theo@example.test',
      'amara@example.test',
    ]);
  });

  it('points at what is not an address, and at an empty box', () => {
    expect(validateEmails('theo@example.test, amara')).toBe('Not an e-mail address: amara');
    expect(validateEmails(' \n ')).toBe('Enter at least one e-mail address.');
    expect(validateEmails('theo@example.test')).toBe(true);
  });

  it('refuses more than the API takes in one request', () => {
    const many = Array.from({ length: 51 }, (_, i) => `s${i}@example.test`).join('\n');
    expect(validateEmails(many)).toBe('At most 50 addresses at a time (51 entered).');
  });
});
