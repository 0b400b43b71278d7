import type Database from 'better-sqlite3';
import { formatJobNumber, JOB_STATUSES } from '@benchproof/domain';

/** Invented name parts and bike lines; combined they give many distinct, realistic-looking records. */
const FIRST = ['Ada', 'Bram', 'Cleo', 'Dorian', 'Elske', 'Fintan', 'Greta', 'Hallam', 'Ilse', 'Joss', 'Kestrel', 'Linnea', 'Merrit', 'Nell', 'Orrin', 'Petra'];
const LAST = ['Ashgrove', 'Bellweather', 'Coldharbour', 'Dunmore', 'Eastry', 'Fallowby', 'Greenhithe', 'Holloway', 'Inchcape', 'Juniper'];
const LINES = [
  ['Quillon Works', 'Stratus 11'],
  ['Marrowgate', 'Filbert 3'],
  ['Brackenfold', 'Harrier Loop'],
  ['Quillon Works', 'Tern Mill 10'],
  ['Marrowgate', 'Cobble Dray 9'],
  ['Brackenfold', 'Lumen Step 7'],
  ['Saltmarsh Cycles', 'Heron 105'],
  ['Saltmarsh Cycles', 'Curlew SL'],
] as const;

export interface BulkCounts {
  customers: number;
  /** Jobs spread over the customers' bikes (one bike per customer). */
  jobs: number;
}

/**
 * Inserts many customers, bikes and jobs straight into SQLite in one transaction, for
 * tests at scale and the jobs-list benchmark. Rows go through the same tables and
 * triggers as the API's, so search indexes stay in step.
 */
export function seedBulkRecords(sqlite: Database.Database, shopId: number, counts: BulkCounts, startSeq = 100_000): void {
  const now = Date.UTC(2026, 10, 1);
  const addCustomer = sqlite.prepare('INSERT INTO customers (shop_id, name, email, phone, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?) RETURNING id');
  const addBike = sqlite.prepare(
    `INSERT INTO bikes (shop_id, customer_id, maker, model, frame_material, serial_number, drivetrain_speeds, brake_type, cable_routing, dropout_type, created_at, updated_at)
     VALUES (?, ?, ?, ?, 'aluminium', ?, 11, 'hydraulic_disc', 'internal', 'vertical', ?, ?) RETURNING id`,
  );
  const addJob = sqlite.prepare(
    `INSERT INTO jobs (shop_id, number, bike_id, customer_id, status, reported_symptoms, promised_on, booked_in_at, created_at, updated_at)
     VALUES (?, ?, ?, ?, ?, 'Gears skip under load', ?, ?, ?, ?)`,
  );
  sqlite.transaction(() => {
    const owners: { customer: number; bike: number }[] = [];
    for (let i = 0; i < counts.customers; i++) {
      const name = `${FIRST[i % FIRST.length]} ${LAST[Math.floor(i / FIRST.length) % LAST.length]} ${i}`;
      const at = now - i * 60_000;
      const { id: customer } = addCustomer.get(shopId, name, `owner${i}@bulk.test`, `0700 ${String(i).padStart(6, '0')}`, at, at) as { id: number };
      const [maker, model] = LINES[i % LINES.length];
      const { id: bike } = addBike.get(shopId, customer, maker, model, `BLK-${i}`, at, at) as { id: number };
      owners.push({ customer, bike });
    }
    for (let j = 0; j < counts.jobs; j++) {
      const o = owners[j % owners.length];
      // Most jobs of a shop's history are collected; a few dozen are open at any time.
      const status = j % 200 < 197 ? 'collected' : JOB_STATUSES[j % 5];
      const day = new Date(now - (counts.jobs - j) * 3_600_000 * 3);
      const at = day.getTime();
      addJob.run(shopId, formatJobNumber(2020 + (j % 7), startSeq + j), o.bike, o.customer, status, day.toISOString().slice(0, 10), at, at, at);
    }
  })();
}
