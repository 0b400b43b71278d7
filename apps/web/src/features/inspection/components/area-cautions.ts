import { areaCautions as domainAreaCautions, type InspectionArea } from '@benchproof/domain';

/** The server's cautions for an area plus libs/domain's (carbon adds its own), each once. */
export function areaCautions(area: InspectionArea, fromServer: string[], carbonFrame: boolean): string[] {
  return [...new Set([...fromServer, ...domainAreaCautions(area, { carbonFrame })])];
}
