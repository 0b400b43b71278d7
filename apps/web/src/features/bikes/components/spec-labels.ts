import type { BikeDto } from '@benchproof/contracts';
import {
  BRAKE_TYPES,
  BRAKE_TYPE_LABELS,
  CABLE_ROUTINGS,
  CABLE_ROUTING_LABELS,
  DROPOUT_TYPES,
  DROPOUT_TYPE_LABELS,
  FRAME_MATERIALS,
  FRAME_MATERIAL_LABELS,
} from '@benchproof/domain';

const opts = <T extends string>(values: readonly T[], labels: Readonly<Record<T, string>>) => values.map((v) => ({ value: v, label: labels[v] }));
export const FRAME_OPTIONS = opts(FRAME_MATERIALS, FRAME_MATERIAL_LABELS);
export const BRAKE_OPTIONS = opts(BRAKE_TYPES, BRAKE_TYPE_LABELS);
export const ROUTING_OPTIONS = opts(CABLE_ROUTINGS, CABLE_ROUTING_LABELS);
export const DROPOUT_OPTIONS = opts(DROPOUT_TYPES, DROPOUT_TYPE_LABELS);
export { BRAKE_TYPE_LABELS, CABLE_ROUTING_LABELS, DROPOUT_TYPE_LABELS, FRAME_MATERIAL_LABELS };

export const bikeLabel = (b: Pick<BikeDto, 'maker' | 'model' | 'year'>) => `${b.maker} ${b.model}${b.year ? ` (${b.year})` : ''}`;

/** A bike spec as a form holds it: every box a string or a number being typed. */
export interface BikeFormValues {
  maker: string;
  model: string;
  year: number | string;
  frameMaterial: BikeDto['frameMaterial'];
  size: string;
  colour: string;
  serialNumber: string;
  drivetrainSpeeds: number | string;
  brakeType: BikeDto['brakeType'];
  cableRouting: BikeDto['cableRouting'];
  dropoutType: BikeDto['dropoutType'];
  tyreSize: string;
}

export const EMPTY_BIKE: BikeFormValues = {
  maker: '',
  model: '',
  year: '',
  frameMaterial: 'aluminium',
  size: '',
  colour: '',
  serialNumber: '',
  drivetrainSpeeds: 11,
  brakeType: 'hydraulic_disc',
  cableRouting: 'external',
  dropoutType: 'vertical',
  tyreSize: '',
};

/** Form values → what the contract's bike schemas parse (empty year = unknown, empty texts = none). */
export function bikeFormToInput(v: BikeFormValues) {
  return { ...v, year: v.year === '' ? null : Number(v.year), drivetrainSpeeds: v.drivetrainSpeeds === '' ? Number.NaN : Number(v.drivetrainSpeeds) };
}

/** The one bike form model: book-in (jobs, through the route) and the bike form both use it. */
export const BIKE_FORM_MODEL = { empty: EMPTY_BIKE, toInput: bikeFormToInput };

export function bikeToForm(b: BikeDto): BikeFormValues {
  return { ...b, year: b.year ?? '', size: b.size ?? '', colour: b.colour ?? '', serialNumber: b.serialNumber ?? '', tyreSize: b.tyreSize ?? '' };
}
