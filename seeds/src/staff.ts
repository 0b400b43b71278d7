/**
 * The invented demo scenario: two shops so that shop isolation can be seen and tested.
 * Every name, address and e-mail here is made up; e-mails use the reserved `.test` domain.
 */
import type { Role, UnitSystem } from '@benchproof/contracts';

export const DEMO_PASSWORD = 'bench-demo-2026';

export interface DemoStaff {
  name: string;
  email: string;
  role: Role;
}

export interface DemoShop {
  key: 'lantern' | 'reed';
  name: string;
  address: string;
  email: string;
  phone: string;
  currency: string;
  labourRateMinor: number;
  taxRateBp: number;
  units: UnitSystem;
  pageSize: 'A4' | 'Letter';
  finalCheckSecondPerson: boolean;
  brandPrimary: string;
  brandAccent: string;
  reportFooter: string;
  staff: DemoStaff[];
}

export const DEMO_SHOPS: DemoShop[] = [
  {
    key: 'lantern',
    name: 'Lantern & Spoke Workshop',
    address: '14 Cinder Lane, Millbrook MB4 2QT',
    email: 'bench@lantern-spoke.test',
    phone: '+44 1632 960 418',
    currency: 'GBP',
    labourRateMinor: 6000,
    taxRateBp: 2000,
    units: 'metric',
    pageSize: 'A4',
    finalCheckSecondPerson: true,
    brandPrimary: '#1F5F5B',
    brandAccent: '#E0A526',
    reportFooter: 'Lantern & Spoke Workshop · Workmanship re-adjustments free within 30 days.',
    staff: [
      { name: 'Mara Quillfeather', email: 'mara@lantern-spoke.test', role: 'manager' },
      { name: 'Dev Okonjo-Hale', email: 'desk@lantern-spoke.test', role: 'desk' },
      { name: 'Tobin Ashgrove', email: 'tobin@lantern-spoke.test', role: 'mechanic' },
      { name: 'Ines Varrow', email: 'ines@lantern-spoke.test', role: 'mechanic' },
    ],
  },
  {
    key: 'reed',
    name: 'Hollow Reed Cycles',
    address: '3 Weir Street, Easterby EB1 7LN',
    email: 'hello@hollow-reed.test',
    phone: '+44 1632 960 733',
    currency: 'GBP',
    labourRateMinor: 5500,
    taxRateBp: 2000,
    units: 'metric',
    pageSize: 'A4',
    finalCheckSecondPerson: false,
    brandPrimary: '#5B2A86',
    brandAccent: '#F2C14E',
    reportFooter: 'Hollow Reed Cycles',
    staff: [
      { name: 'Priya Lanterman', email: 'priya@hollow-reed.test', role: 'manager' },
      { name: 'Oskar Brell', email: 'oskar@hollow-reed.test', role: 'mechanic' },
    ],
  },
];
