import { Text, View } from '@react-pdf/renderer';
import { DO_NOT_RIDE } from '@benchproof/domain';
import type { ReportImage, ReportSnapshot, ShotRef } from '../report-data';
import { fmtTimecode } from './format';
import { ConditionMark, Shot } from './parts.pdf';
import { CONDITION_MARK, GUTTER, RULE, styles } from './theme';

export type Images = Map<number, ReportImage>;

interface GridProps {
  shots: (ShotRef & { label?: string })[];
  images: Images;
  slot: number;
}

/** Shots two to a row, each fitted into a slot about 3.5 in wide. */
function ShotGrid({ shots, images, slot }: GridProps) {
  return (
    <View style={[styles.row, { flexWrap: 'wrap', gap: GUTTER, marginTop: 6 }]}>
      {shots.map((s, i) => (
        <Shot
          key={`${s.assetId}-${i}`}
          image={images.get(s.assetId)}
          width={slot}
          maxHeight={slot * 0.9}
          caption={[s.label, s.caption].filter(Boolean).join(' · ')}
        />
      ))}
    </View>
  );
}

export function Findings({ snap, images, slot }: { snap: ReportSnapshot; images: Images; slot: number }) {
  if (snap.findings.length === 0) return null;
  const ink = snap.shop.palette.primaryInk.used;
  return (
    <View break>
      <Text style={[styles.h1, { color: ink }]}>Findings</Text>
      {snap.findings.map((f) => (
        <View key={f.id} style={{ marginBottom: 14, paddingBottom: 10, borderBottomWidth: 0.5, borderBottomColor: RULE }}>
          <View wrap={false}>
            <View style={[styles.row, { justifyContent: 'space-between', alignItems: 'center' }]}>
              <Text style={[styles.h2, { marginTop: 0, marginBottom: 2 }]}>{f.title}</Text>
              <ConditionMark condition={f.condition} size={12} />
            </View>
            {f.doNotRide && <Text style={{ color: CONDITION_MARK.unsafe.colour, fontWeight: 700 }}>{DO_NOT_RIDE}</Text>}
            <Text>{f.description}</Text>
          </View>
          {f.shots.length > 0 && <ShotGrid shots={f.shots} images={images} slot={slot} />}
        </View>
      ))}
    </View>
  );
}

/** Before and after of the same area side by side, with the caption under the pair. */
export function Pairs({ snap, images, slot }: { snap: ReportSnapshot; images: Images; slot: number }) {
  if (snap.pairs.length === 0) return null;
  return (
    <View>
      <Text style={[styles.h1, styles.sectionGap, { color: snap.shop.palette.primaryInk.used }]} minPresenceAhead={200}>
        Before and after
      </Text>
      {snap.pairs.map((p, i) => (
        <View key={i} wrap={false} style={{ marginBottom: 14 }}>
          <View style={[styles.row, { gap: GUTTER }]}>
            <Shot image={images.get(p.before.assetId)} width={slot} maxHeight={slot} caption={`Before${p.before.caption ? ` · ${p.before.caption}` : ''}`} />
            <Shot image={images.get(p.after.assetId)} width={slot} maxHeight={slot} caption={`After${p.after.caption ? ` · ${p.after.caption}` : ''}`} />
          </View>
          {p.caption ? <Text style={{ marginTop: 3, fontWeight: 600 }}>{p.caption}</Text> : null}
        </View>
      ))}
    </View>
  );
}

export function ScopeStills({ snap, images, slot, caution }: { snap: ReportSnapshot; images: Images; slot: number; caution: string }) {
  if (snap.scopeStills.length === 0) return null;
  return (
    <View>
      <Text style={[styles.h1, styles.sectionGap, { color: snap.shop.palette.primaryInk.used }]} minPresenceAhead={200}>
        Inside the frame
      </Text>
      <Text style={styles.small}>{caution}</Text>
      <ShotGrid
        shots={snap.scopeStills.map((s) => ({ ...s, label: s.timecodeMs !== null ? `at ${fmtTimecode(s.timecodeMs)}` : undefined }))}
        images={images}
        slot={slot}
      />
    </View>
  );
}
