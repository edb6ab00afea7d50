import type { ReactElement } from 'react';

export interface JobFieldsView {
  title: string;
  client: string;
  siteAddress: string;
  notes: string;
  status: string;
  revision: number;
}

const NAMES: [keyof JobFieldsView, string][] = [
  ['title', 'Title'],
  ['client', 'Client'],
  ['siteAddress', 'Site address'],
  ['status', 'Status'],
  ['notes', 'Notes'],
];
const button = 'min-h-11 rounded-md border border-rule bg-white px-3';

interface Props {
  mine: JobFieldsView;
  theirs: JobFieldsView;
  onReload: () => void;
  onOverwrite: () => void;
}

/**
 * Shown when a save lost to a newer one: the typed text stays in the form, and the user chooses
 * to take the saved version or to put theirs over it on purpose.
 */
export default function JobConflict({ mine, theirs, onReload, onOverwrite }: Props): ReactElement {
  const differ = NAMES.filter(([k]) => mine[k] !== theirs[k]).map(([, w]) => w);
  return (
    <div role="alert" className="grid gap-2 rounded-md border-2 border-verdict-edge bg-verdict-edge-wash p-3" data-testid="job-conflict">
      <p>
        <strong>Not saved: someone saved this job after you opened it.</strong> Your changes are still
        in the form.{differ.length > 0 && ` The saved job differs from yours in: ${differ.join(', ')}.`}
      </p>
      <div className="flex flex-wrap gap-2">
        <button type="button" className={button} onClick={onReload}>
          Load the saved job (drop my changes)
        </button>
        <button type="button" className={button} onClick={onOverwrite}>
          Save mine over it
        </button>
      </div>
    </div>
  );
}
