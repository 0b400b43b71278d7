import { Text, View } from '@react-pdf/renderer';
import { CONDITIONS, DECLINED_SAFETY_NOTICE, DO_NOT_RIDE, URGENCY_LABELS } from '@benchproof/domain';
import type { ReportSnapshot } from '../report-data';
import { ConditionMark } from './parts.pdf';
import { CONDITION_MARK, styles } from './theme';

/** Items that must not be ridden on: anything unsafe, and every declined safety recommendation. */
export function doNotRideItems(snap: ReportSnapshot): { unsafe: string[]; declined: string[] } {
  return {
    unsafe: snap.findings.filter((f) => f.doNotRide || f.condition === 'unsafe').map((f) => f.title),
    declined: snap.recommendations.filter((r) => r.safety && r.status === 'declined').map((r) => `${r.findingTitle}: ${r.summary}`),
  };
}

/** The "do not ride" boxes; printed on the summary and again beside the recommendations. */
export function DoNotRide({ snap }: { snap: ReportSnapshot }) {
  const { unsafe, declined } = doNotRideItems(snap);
  return (
    <>
      {unsafe.length > 0 && (
        <View style={styles.danger} wrap={false}>
          <Text style={{ fontWeight: 700, color: CONDITION_MARK.unsafe.colour, fontSize: 12 }}>{DO_NOT_RIDE}</Text>
          <Text>We found these unsafe: {unsafe.join('; ')}. Do not ride the bike until they are fixed.</Text>
        </View>
      )}
      {declined.length > 0 && (
        <View style={styles.danger} wrap={false}>
          <Text style={{ fontWeight: 700, color: CONDITION_MARK.unsafe.colour, fontSize: 12 }}>Declined safety work</Text>
          {declined.map((d) => (
            <Text key={d}>• {d}</Text>
          ))}
          <Text style={{ marginTop: 3, fontWeight: 600 }}>{DECLINED_SAFETY_NOTICE}</Text>
        </View>
      )}
    </>
  );
}

/**
 * The work log's first lines. Without a work log the section says what the after photos show
 * when there are pairs, and is left out when there are none: an empty log is not an error to print.
 */
function WhatWeDid({ snap, ink }: { snap: ReportSnapshot; ink: string }) {
  if (snap.work.length === 0 && snap.pairs.length === 0) return null;
  return (
    <>
      <Text style={[styles.h2, { color: ink }]}>What we did</Text>
      {snap.work.length === 0 && <Text>The after photos under “Before and after” show the parts as we left them.</Text>}
      {snap.work.slice(0, 8).map((w, i) => (
        <Text key={i}>• {w.description}</Text>
      ))}
      {snap.work.length > 8 && <Text style={styles.muted}>…and {snap.work.length - 8} more (see Work done).</Text>}
    </>
  );
}

/** One page: what we found, what we did, what we recommend next, with the condition scale. */
export function Summary({ snap }: { snap: ReportSnapshot }) {
  const next = snap.recommendations.filter((r) => r.status !== 'approved');
  const ink = snap.shop.palette.primaryInk.used;
  return (
    <View>
      <Text style={[styles.h1, { color: ink }]}>Summary</Text>
      <DoNotRide snap={snap} />
      <Text style={[styles.h2, { color: ink }]}>What we found</Text>
      {snap.findings.length === 0 && <Text style={styles.muted}>Nothing needing attention was recorded.</Text>}
      {snap.findings.map((f) => (
        <View key={f.id} style={[styles.row, { marginBottom: 3 }]} wrap={false}>
          <View style={{ width: 150 }}>
            <ConditionMark condition={f.condition} />
          </View>
          <Text style={{ flex: 1 }}>{f.title}</Text>
        </View>
      ))}
      <WhatWeDid snap={snap} ink={ink} />
      <Text style={[styles.h2, { color: ink }]}>What we recommend next</Text>
      {next.length === 0 && <Text style={styles.muted}>Nothing further at this visit.</Text>}
      {next.map((r, i) => (
        <Text key={i}>
          • {r.summary} ({URGENCY_LABELS[r.urgency].toLowerCase()}
          {r.status === 'declined' ? ', declined' : ''})
        </Text>
      ))}
      <View style={[styles.box, { marginTop: 16 }]} wrap={false}>
        <Text style={[styles.h3, { marginBottom: 5 }]}>How to read the condition marks</Text>
        <View style={[styles.row, { gap: 18 }]}>
          {CONDITIONS.map((c) => (
            <ConditionMark key={c} condition={c} />
          ))}
        </View>
      </View>
    </View>
  );
}
