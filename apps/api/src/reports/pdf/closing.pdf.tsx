import { Path, Svg, Text, View } from '@react-pdf/renderer';
import { qrPath } from '../../infra/pdf/qr';
import type { IssueStamp, ReportSnapshot } from '../report-data';
import { fmtDate } from './format';
import { MUTED, styles } from './theme';

/** Cautions, sign-off, the shop's footer and — on an issued version — the fingerprint, verify link and QR code. */
export function Closing({ snap, stamp }: { snap: ReportSnapshot; stamp: IssueStamp | null }) {
  const ink = snap.shop.palette.primaryInk.used;
  const fc = snap.finalCheck;
  return (
    <View>
      <Text style={[styles.h1, styles.sectionGap, { color: ink }]} minPresenceAhead={80}>
        Safety notes
      </Text>
      {snap.cautions.map((c) => (
        <Text key={c} style={{ marginBottom: 5 }}>
          {c}
        </Text>
      ))}
      <Text style={[styles.h2, { color: ink }]}>Sign-off</Text>
      <View style={[styles.row, { gap: 24 }]} wrap={false}>
        <View style={{ flex: 1 }}>
          <Text style={styles.small}>MECHANIC</Text>
          <Text style={{ fontWeight: 600 }}>{snap.job.mechanic ?? '—'}</Text>
        </View>
        <View style={{ flex: 1 }}>
          <Text style={styles.small}>FINAL CHECK</Text>
          <Text style={{ fontWeight: 600 }}>{fc ? `${fc.passed ? 'Passed' : 'Not passed'} · ${fc.checker}` : 'Not recorded'}</Text>
          {fc && (
            <Text style={styles.muted}>
              {fmtDate(fc.at)}
              {fc.notes ? ` · Test ride: ${fc.notes}` : ''}
            </Text>
          )}
        </View>
      </View>
      {snap.shop.footer ? <Text style={[styles.small, { marginTop: 14 }]}>{snap.shop.footer}</Text> : null}
      {stamp ? <Verification stamp={stamp} /> : <DraftNote />}
    </View>
  );
}

function Verification({ stamp }: { stamp: IssueStamp }) {
  const qr = qrPath(stamp.verifyUrl);
  return (
    <View style={[styles.box, styles.row, { marginTop: 18, gap: 12, alignItems: 'center' }]} wrap={false}>
      <Svg width={78} height={78} viewBox={`-2 -2 ${qr.size + 4} ${qr.size + 4}`}>
        <Path d={qr.d} fill="#000000" />
      </Svg>
      <View style={{ flex: 1 }}>
        <Text style={styles.h3}>Check this report</Text>
        <Text>
          Version {stamp.version}, issued {fmtDate(stamp.issuedAt)}. To check that it is a report we issued, open
        </Text>
        <Text style={{ fontWeight: 600 }}>{stamp.verifyUrl}</Text>
        <Text style={[styles.small, { marginTop: 4 }]}>Fingerprint (SHA-256 of the report's contents):</Text>
        <Text style={{ fontSize: 7.5, color: MUTED }}>{stamp.fingerprint}</Text>
      </View>
    </View>
  );
}

function DraftNote() {
  return (
    <View style={[styles.box, { marginTop: 18 }]}>
      <Text style={styles.h3}>Draft — not issued</Text>
      <Text>An issued version carries its fingerprint and a link to check it here.</Text>
    </View>
  );
}
