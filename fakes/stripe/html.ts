/** Escape text for HTML. */
export function esc(value: unknown): string {
  return String(value ?? '').replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

export function money(amount: number, currency: string): string {
  return `${(amount / 100).toFixed(2)} ${currency.toUpperCase()}`;
}

export function day(unix: number | null): string {
  return unix ? new Date(unix * 1000).toISOString().slice(0, 10) : '—';
}

/** The frame of every hosted page: plainly marked as the local test stand-in. */
export function page(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${esc(title)} · test payments</title>
<style>
body{font-family:system-ui,sans-serif;margin:0;background:#f3f1ec;color:#1d232b}
main{max-width:30rem;margin:0 auto;padding:1rem}
.test{background:#1d232b;color:#fff;font-size:.8rem;padding:.4rem 1rem;text-align:center}
h1{font-size:1.3rem}section{background:#fff;border-radius:.5rem;padding:1rem;margin:1rem 0}
label{display:block;margin:.8rem 0 .2rem;font-weight:600}
input,select{width:100%;box-sizing:border-box;font-size:1rem;padding:.7rem;border:1px solid #98a1ab;border-radius:.4rem}
button{width:100%;min-height:3rem;font-size:1rem;margin-top:1rem;border:0;border-radius:.4rem;background:#3b4cca;color:#fff}
button.quiet{background:#e4e7ee;color:#1d232b}
.error{background:#fbe3e3;color:#7a1010;padding:.7rem;border-radius:.4rem}
.row{display:flex;gap:.6rem}.row>div{flex:1}table{width:100%;border-collapse:collapse}
td{padding:.3rem 0;border-bottom:1px solid #e4e7ee}
</style></head><body><div class="test">Test mode · local payments stand-in · no real money moves</div>
<main>${body}</main></body></html>`;
}
