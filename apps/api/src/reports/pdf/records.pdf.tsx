import { Text, View } from '@react-pdf/renderer';
import { URGENCY_LABELS } from '@benchproof/domain';
import type { ReportSnapshot } from '../report-data';
import { fmtDate, money } from './format';
import { ConditionMark } from './parts.pdf';
import { DoNotRide } from './summary.pdf';
import { CONDITION_MARK, styles } from './theme';

const TORQUE_VERDICT = { within: 'Within tolerance', under: 'Under — redo', over: 'Over — check part' } as const;

function Cell({ w, children, bold }: { w: number | string; children: React.ReactNode; bold?: boolean }) {
  return <Text style={{ width: w, paddingRight: 6, fontWeight: bold ? 600 : 400 }}>{children}</Text>;
}

export function Measurements({ snap }: { snap: ReportSnapshot }) {
  const ink = snap.shop.palette.primaryInk.used;
  if (snap.measurements.length === 0 && snap.torque.length === 0) return null;
  return (
    <View>
      <Text style={[styles.h1, styles.sectionGap, { color: ink }]} minPresenceAhead={80}>
        Measurements
      </Text>
      {snap.measurements.length === 0 && <Text style={styles.muted}>No measurements were taken at this visit.</Text>}
      {snap.measurements.map((m, i) => (
        <View key={i} style={styles.tableRow} wrap={false}>
          <Cell w="24%" bold>
            {m.label}
          </Cell>
          <Text style={{ width: '56%', paddingRight: 6 }}>{m.message}</Text>
          <View style={{ width: '20%' }}>
            <ConditionMark condition={m.condition} />
          </View>
        </View>
      ))}
      {snap.torque.length > 0 && (
        <View>
          <Text style={[styles.h2, { color: ink }]}>Torque log</Text>
          <View style={styles.tableHead}>
            <Cell w="24%">Fastener</Cell>
            <Cell w="14%">Specified</Cell>
            <Cell w="12%">Applied</Cell>
            <Cell w="22%">Verdict</Cell>
            <Cell w="28%">Source · wrench (calibrated)</Cell>
          </View>
          {snap.torque.map((t, i) => (
            <View key={i} style={styles.tableRow} wrap={false}>
              <Cell w="24%">{t.fastener}</Cell>
              <Cell w="14%">{t.specified}</Cell>
              <Cell w="12%">{t.applied}</Cell>
              <View style={[styles.row, { width: '22%', paddingRight: 6, alignItems: 'flex-start', paddingTop: 2 }]}>
                <ConditionMark condition={t.verdict === 'within' ? 'sound' : 'unsafe'} size={8} label={false} />
                <Text style={{ marginLeft: 3, fontWeight: 600, color: t.verdict === 'within' ? CONDITION_MARK.sound.colour : CONDITION_MARK.unsafe.colour }}>
                  {TORQUE_VERDICT[t.verdict]}
                </Text>
              </View>
              <Cell w="28%">{[t.source, t.tool && `${t.tool}${t.calibratedOn ? ` (${fmtDate(t.calibratedOn, snap)})` : ''}`].filter(Boolean).join(' · ')}</Cell>
            </View>
          ))}
        </View>
      )}
    </View>
  );
}

export function WorkDone({ snap }: { snap: ReportSnapshot }) {
  if (snap.work.length === 0) return null;
  return (
    <View>
      <Text style={[styles.h1, styles.sectionGap, { color: snap.shop.palette.primaryInk.used }]} minPresenceAhead={80}>
        Work done and parts
      </Text>
      <View style={styles.tableHead}>
        <Cell w="46%">Work</Cell>
        <Cell w="30%">Parts</Cell>
        <Cell w="10%">Time</Cell>
        <Cell w="14%">By</Cell>
      </View>
      {snap.work.map((w, i) => (
        <View key={i} style={styles.tableRow} wrap={false}>
          <Cell w="46%">{w.description}</Cell>
          <Cell w="30%">{w.parts || '—'}</Cell>
          <Cell w="10%">{w.minutes} min</Cell>
          <Cell w="14%">{w.by ?? '—'}</Cell>
        </View>
      ))}
    </View>
  );
}

const STATUS = { approved: 'Approved', declined: 'Declined', pending: 'Awaiting your answer' } as const;

export function Recommendations({ snap }: { snap: ReportSnapshot }) {
  if (snap.recommendations.length === 0) return null;
  const cur = snap.shop.currency;
  const t = snap.totals;
  return (
    <View>
      <Text style={[styles.h1, styles.sectionGap, { color: snap.shop.palette.primaryInk.used }]} minPresenceAhead={80}>
        Recommendations and prices
      </Text>
      <View style={styles.tableHead}>
        <Cell w="50%">Recommendation</Cell>
        <Cell w="16%">Urgency</Cell>
        <Cell w="18%">Decision</Cell>
        <Text style={{ width: '16%', textAlign: 'right' }}>Price</Text>
      </View>
      {snap.recommendations.map((r, i) => (
        <View key={i} style={styles.tableRow} wrap={false}>
          <Cell w="50%">{`${r.summary} (${r.findingTitle})`}</Cell>
          <Cell w="16%">{URGENCY_LABELS[r.urgency]}</Cell>
          <Cell w="18%" bold={r.status === 'declined' && r.safety}>
            {STATUS[r.status]}
          </Cell>
          <Text style={{ width: '16%', textAlign: 'right' }}>{money(r.grossMinor, cur)}</Text>
        </View>
      ))}
      <View style={{ alignSelf: 'flex-end', width: '50%', marginTop: 6 }} wrap={false}>
        <Total label="Approved (incl. tax)" value={money(t.approvedMinor, cur)} bold />
        <Total label="of which tax" value={money(t.taxMinor, cur)} />
        <Total label="Declined" value={money(t.declinedMinor, cur)} />
        {t.pendingMinor > 0 && <Total label="Awaiting your answer" value={money(t.pendingMinor, cur)} />}
      </View>
      <View style={{ marginTop: 10 }}>
        <DoNotRide snap={snap} />
      </View>
    </View>
  );
}

function Total({ label, value, bold }: { label: string; value: string; bold?: boolean }) {
  return (
    <View style={[styles.row, { justifyContent: 'space-between', paddingVertical: 2, fontWeight: bold ? 700 : 400 }]}>
      <Text>{label}</Text>
      <Text>{value}</Text>
    </View>
  );
}
