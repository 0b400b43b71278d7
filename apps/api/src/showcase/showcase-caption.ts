import { INSPECTION_AREA_LABELS, MEDIA_AREA_LABELS, type MediaArea } from '@benchproof/domain';
import type { FindingDto } from '@benchproof/contracts';

export interface CaptionFacts {
  area: MediaArea;
  findings: Pick<FindingDto, 'area' | 'condition'>[];
  workCount: number;
  /** Only when the consent allows naming the bike. */
  bike: { maker: string; model: string } | null;
}

/**
 * A short marketing caption in our own template text. It never uses the owner's name
 * or any free text typed on the job (which could hold it): only area labels, counts,
 * and the make and model when the consent allows.
 */
export function draftCaption(f: CaptionFacts): string {
  const area = MEDIA_AREA_LABELS[f.area].toLowerCase();
  const on = f.bike ? ` on a ${`${f.bike.maker} ${f.bike.model}`.trim()}` : '';
  const fixed = [...new Set(f.findings.filter((x) => x.condition !== 'sound').map((x) => INSPECTION_AREA_LABELS[x.area].toLowerCase()))];
  const found = fixed.length ? ` We found work needed on the ${list(fixed)}` : ' Everything checked';
  const done = f.workCount ? ` and logged ${f.workCount} job${f.workCount === 1 ? '' : 's'} on the stand.` : '.';
  return `Before and after: ${area}${on}.${found}${done}`;
}

function list(items: string[]): string {
  return items.length <= 1 ? items.join('') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}
