/**
 * The shapes of the invented demo records (owners, bikes, visits). Days are relative
 * to the day the seed runs, so some promised dates are overdue.
 */
import type { ContactChannel, DecisionChannel } from '@benchproof/contracts';
import type {
  BrakeType,
  CableRouting,
  Condition,
  DropoutType,
  FrameMaterial,
  InspectionArea,
  JobStatus,
  MeasurementInput,
  Threadlocker,
  Urgency,
} from '@benchproof/domain';

export type DemoStatus = JobStatus;

export interface DemoOwner {
  key: string;
  name: string;
  email: string | null;
  phone: string | null;
  preferredChannel: ContactChannel;
}

export interface DemoBike {
  key: string;
  owner: string;
  maker: string;
  model: string;
  year: number | null;
  frameMaterial: FrameMaterial;
  size: string | null;
  colour: string | null;
  serialNumber: string | null;
  drivetrainSpeeds: number;
  brakeType: BrakeType;
  cableRouting: CableRouting;
  dropoutType: DropoutType;
  tyreSize: string | null;
}

export interface DemoFinding {
  area: InspectionArea;
  condition: Condition;
  description: string;
  recommendation?: {
    summary: string;
    /** CHECKS.md A.2 step 4: safety-critical, recommended soon, advisory. */
    urgency: Urgency;
    parts: { description: string; qty: number; unitPriceMinor: number }[];
    labourHundredths: number;
    decision?: { status: 'approved' | 'declined'; channel: Exclude<DecisionChannel, 'owner_link'>; decidedByName: string };
  };
}

export interface DemoTorque {
  fastener: string;
  spec: number;
  unit: 'nm';
  applied: number;
  specSource: string;
  tool: string;
  /** The wrench was last calibrated this many days before the work (the job's booking day). */
  toolCalibratedDaysBefore?: number;
  threadlocker?: Threadlocker;
  carbonPart: boolean;
}

export interface DemoJob {
  shop: 'lantern' | 'reed';
  bike: string;
  status: DemoStatus;
  /** Booked this many days before the seed runs. */
  daysAgo: number;
  /** Promised this many days after booking. */
  promisedAfterDays: number;
  mechanic: string | null;
  symptoms: string;
  conditions?: Record<string, Condition>;
  measurements?: { checkpoint: string; input: MeasurementInput }[];
  findings?: DemoFinding[];
  /** `chargeable`: the time is charged to the owner at the shop's labour rate. */
  work?: { description: string; partsUsed: string; minutes: number; chargeable?: boolean }[];
  torque?: DemoTorque[];
  /** Who signs the final check (e-mail), for jobs at ready or beyond. */
  checker?: string;
}
