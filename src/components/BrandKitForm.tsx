import { useEffect, useState } from 'react';
import type { ReactElement } from 'react';
import { checkOnWhite, isHexColour } from '../lib/brand/contrast';
import { api, ApiError } from '../lib/jobs/client-api';

interface Brand { companyName: string; primaryColour: string; accentColour: string; licenceNumber: string; contactBlock: string; reportFooter: string; logoFile: string | null }
interface Verdict { ratio: number; textOnPaper: 'aa' | 'large_only' | 'fails' }
interface Answer { brand: Brand; contrast: { primary: Verdict; accent: Verdict } }
const WORDS = { aa: 'readable as text on white (WCAG AA)', large_only: 'large text only on white', fails: 'too faint on white' } as const;
const field = 'min-h-11 rounded-md border border-rule bg-white px-3';

function fieldErrors(e: Error): Record<string, string> {
  const issues = e instanceof ApiError ? (e.body.issues as { path: string; message: string }[] | undefined) : undefined;
  return Object.fromEntries((issues ?? []).map((i) => [i.path, i.message]));
}

/** The owner's brand kit: name, logo, two colours with a contrast check, licence, contact, footer. */
export default function BrandKitForm(): ReactElement {
  const [a, setA] = useState<Answer | null>(null);
  const [msg, setMsg] = useState('');
  const [logoKey, setLogoKey] = useState(0);
  // The server's refusals by field, shown under the field they concern.
  const [errors, setErrors] = useState<Record<string, string>>({});
  useEffect(() => void api<Answer>('/api/brand').then(setA).catch((e: Error) => setMsg(e.message)), []);
  if (!a) return <p role="status">{msg || 'Loading…'}</p>;
  const b = a.brand;
  const set = (k: keyof Brand) => (e: { target: { value: string } }): void => setA({ ...a, brand: { ...b, [k]: e.target.value } });
  const save = (): void => {
    const { companyName, primaryColour, accentColour, licenceNumber, contactBlock, reportFooter } = b;
    api<Answer>('/api/brand', { method: 'PUT', body: { companyName, primaryColour, accentColour, licenceNumber, contactBlock, reportFooter } })
      .then((r) => { setA(r); setErrors({}); setMsg('Brand kit saved.'); })
      .catch((e: Error) => { setErrors(fieldErrors(e)); setMsg(e instanceof ApiError && e.status === 400 ? 'Not saved: see the field marked below.' : e.message); });
  };
  const upload = async (file: File): Promise<void> => {
    const form = new FormData();
    form.set('logo', file);
    const r = await fetch('/api/brand/logo', { method: 'POST', body: form });
    const body = await r.json().catch(() => ({}));
    setMsg(r.ok ? 'Logo saved.' : body.message ?? 'Upload failed.');
    if (r.ok) setLogoKey(Date.now());
  };
  // The same check the server refuses a save by, live as the owner types.
  const colour = (k: 'primaryColour' | 'accentColour', label: string, saved: Verdict): ReactElement => {
    const v = isHexColour(b[k]) ? checkOnWhite(b[k]) : saved;
    return (
      <label className="grid gap-1">{label}
        <span className="flex items-center gap-2"><input type="color" value={b[k]} onChange={set(k)} className="h-11 w-14" /><input className={field} value={b[k]} onChange={set(k)} /></span>
        <span className="text-step--1">Contrast {v.ratio.toFixed(2)}:1 — {WORDS[v.textOnPaper]}</span>
        {errors[k] && <span className="font-semibold text-verdict-fails" data-testid={`error-${k}`}>{label.replace(/ \(.*/, '')} {errors[k]}</span>}
      </label>
    );
  };
  return (
    <form className="grid gap-3" onSubmit={(e) => { e.preventDefault(); save(); }}>
      <label className="grid gap-1">Company name<input className={field} value={b.companyName} onChange={set('companyName')} required /></label>
      <div className="grid gap-1">Logo (PNG, JPEG or WebP, up to 2 MB)
        {(b.logoFile || logoKey > 0) && <img src={`/api/brand/logo?v=${logoKey}`} alt="Current logo" className="max-h-16 max-w-48" />}
        <input type="file" accept="image/png,image/jpeg,image/webp" onChange={(e) => e.target.files?.[0] && void upload(e.target.files[0])} />
      </div>
      {colour('primaryColour', 'Main colour (headings)', a.contrast.primary)}
      {colour('accentColour', 'Second colour (figures, rules)', a.contrast.accent)}
      <label className="grid gap-1">Licence or registration number<input className={field} value={b.licenceNumber} onChange={set('licenceNumber')} /></label>
      <label className="grid gap-1">Contact block<textarea className="min-h-20 rounded-md border border-rule p-2" value={b.contactBlock} onChange={set('contactBlock')} /></label>
      <label className="grid gap-1">Report footer<textarea className="min-h-16 rounded-md border border-rule p-2" value={b.reportFooter} onChange={set('reportFooter')} /></label>
      <button className="min-h-11 rounded-md bg-teal-deep px-4 font-semibold text-white">Save brand kit</button>
      {msg && <p role="status">{msg}</p>}
    </form>
  );
}
