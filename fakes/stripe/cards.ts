/**
 * Test cards the fake's hosted checkout accepts. Any other number that passes the Luhn check
 * behaves like the first one.
 */
export const TEST_CARDS = {
  succeeds: '4242424242424242',
  declined: '4000000000000002',
  /** Accepted at checkout; every later charge fails, so the subscription falls past due. */
  failsLater: '4000000000000341',
} as const;

export type CardOutcome =
  | { ok: true; behaviour: 'ok' | 'fail_later'; last4: string; brand: string }
  | { ok: false; code: string; message: string };

function luhn(digits: string): boolean {
  let sum = 0;
  for (let i = 0; i < digits.length; i++) {
    let d = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) d = d * 2 > 9 ? d * 2 - 9 : d * 2;
    sum += d;
  }
  return sum % 10 === 0;
}

/** Check a card as the hosted form submits it: number, MM / YY expiry and CVC. */
export function checkCard(number: string, expiry: string, cvc: string, nowMs: number): CardOutcome {
  const digits = number.replace(/[\s-]/g, '');
  if (!/^\d{12,19}$/.test(digits) || !luhn(digits)) {
    return { ok: false, code: 'incorrect_number', message: 'Your card number is incorrect.' };
  }
  const m = /^\s*(\d{1,2})\s*\/\s*(\d{2}|\d{4})\s*$/.exec(expiry);
  const month = m ? Number(m[1]) : 0;
  const year = m ? (m[2].length === 2 ? 2000 + Number(m[2]) : Number(m[2])) : 0;
  if (!m || month < 1 || month > 12 || Date.UTC(year, month, 1) <= nowMs) {
    return {
      ok: false,
      code: 'invalid_expiry',
      message: "Your card's expiry date is not valid or has passed.",
    };
  }
  if (!/^\d{3,4}$/.test(cvc.trim())) {
    return { ok: false, code: 'incorrect_cvc', message: "Your card's security code is incorrect." };
  }
  if (digits === TEST_CARDS.declined) {
    return { ok: false, code: 'card_declined', message: 'Your card was declined.' };
  }
  const behaviour = digits === TEST_CARDS.failsLater ? 'fail_later' : 'ok';
  return {
    ok: true,
    behaviour,
    last4: digits.slice(-4),
    brand: digits.startsWith('4') ? 'visa' : 'card',
  };
}
