import { SHOWCASE_BACKGROUND_FROM, type ShowcaseExportTaskDto, type ShowcaseZipRequest } from '@benchproof/contracts';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { downloadZip, startExport } from '../api/showcase';
import { exportFailure } from '../components/export-failure';

export interface ZipProblem {
  title: string;
  message: string;
}

/**
 * A zip of a selection: a few files stream straight down; from SHOWCASE_BACKGROUND_FROM
 * files on, the server makes it as a background task and the screen follows its progress.
 */
export function useZipExport() {
  const [task, setTask] = useState<{ start: ShowcaseExportTaskDto; files: number } | null>(null);
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<ZipProblem | null>(null);
  const run = async (req: ShowcaseZipRequest) => {
    setBusy(true);
    setProblem(null);
    setTask(null);
    try {
      if (req.items.length >= SHOWCASE_BACKGROUND_FROM) setTask({ start: await startExport(req), files: req.items.length });
      else await downloadZip(req);
    } catch (e) {
      setProblem(e instanceof ApiError ? exportFailure(e.code, e.message) : exportFailure(null, null));
    } finally {
      setBusy(false);
    }
  };
  return { task, busy, problem, run, dismiss: () => setTask(null) };
}
