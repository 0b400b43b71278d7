import { Image, Page, Text, View } from '@react-pdf/renderer';
import type { PageSize } from '@benchproof/contracts';
import type { IssueStamp, ReportImage, ReportSnapshot } from '../report-data';
import { fmtDate, money } from './format';
import { ConditionMark } from './parts.pdf';
import { MARGIN, MUTED, PAGE_POINTS, styles } from './theme';

interface Props {
  snap: ReportSnapshot;
  pageSize: PageSize;
  logo: ReportImage | null;
  stamp: IssueStamp | null;
}

/** The cover: brand band with the text colour the contrast check picked, logo, job, bike, owner and dates. */
export function Cover({ snap, pageSize, logo, stamp }: Props) {
  return (
    <Page size={pageSize === 'A4' ? 'A4' : 'LETTER'} style={styles.coverPage}>
      <BrandBand snap={snap} pageSize={pageSize} logo={logo} stamp={stamp} />
      <View style={{ backgroundColor: snap.shop.palette.accent.background, height: 8 }} />
      <JobDetails snap={snap} />
      <CoverFooter snap={snap} />
    </Page>
  );
}

function BrandBand({ snap, pageSize, logo, stamp }: Props) {
  const { primary } = snap.shop.palette;
  const logoH = 56;
  const logoW = logo ? Math.min(180, (logoH * logo.width) / logo.height) : 0;
  return (
    <View
      style={{
        backgroundColor: primary.background,
        height: PAGE_POINTS[pageSize].height * 0.42,
        paddingHorizontal: MARGIN,
        paddingTop: 48,
        color: primary.text,
      }}
    >
      {logo && (
        <View style={{ backgroundColor: '#FFFFFF', alignSelf: 'flex-start', padding: 8, borderRadius: 4, marginBottom: 24 }}>
          <Image src={{ data: logo.data, format: 'jpg' }} style={{ width: logoW, height: logoH }} />
        </View>
      )}
      <Text style={{ fontSize: 14, fontWeight: 600 }}>{snap.shop.name}</Text>
      <Text style={{ fontSize: 30, fontWeight: 700, marginTop: 6 }}>Bench report</Text>
      <Text style={{ fontSize: 16, marginTop: 6 }}>Job {snap.job.number}</Text>
      {stamp ? (
        <Text style={{ fontSize: 11, marginTop: 4 }}>
          Version {stamp.version} · issued {fmtDate(stamp.issuedAt, snap)}
        </Text>
      ) : (
        <Text style={{ fontSize: 11, marginTop: 4 }}>Draft — not issued</Text>
      )}
    </View>
  );
}

function JobDetails({ snap }: { snap: ReportSnapshot }) {
  const ink = snap.shop.palette.primaryInk.used;
  return (
    <View style={{ paddingHorizontal: MARGIN, paddingTop: 28 }}>
      <Field
        label="Bike"
        value={snap.bike.title}
        sub={[snap.bike.detail, snap.bike.serial && `Frame no. ${snap.bike.serial}`].filter(Boolean).join(' · ')}
        ink={ink}
      />
      <Field label="Owner" value={snap.owner.name} ink={ink} />
      <View style={[styles.row, { gap: 28 }]}>
        <Field label="Booked in" value={fmtDate(snap.job.bookedAt, snap)} ink={ink} />
        <Field label="Ready" value={fmtDate(snap.job.readyAt, snap)} ink={ink} />
        <Field label="Mechanic" value={snap.job.mechanic ?? '—'} ink={ink} />
        <Payment snap={snap} ink={ink} />
      </View>
      <Field label="What you told us" value="" sub={snap.job.symptoms} ink={ink} />
      {snap.overall && (
        <View style={{ marginTop: 8 }}>
          <Text style={[styles.small, { marginBottom: 3 }]}>OVERALL</Text>
          <ConditionMark condition={snap.overall} size={14} />
        </View>
      )}
    </View>
  );
}

/** "Paid" with the day the balance reached zero, or what is still due; nothing when nothing was charged (or an older snapshot). */
function Payment({ snap, ink }: { snap: ReportSnapshot; ink: string }) {
  const p = snap.payment;
  if (!p || p.grossMinor <= 0) return null;
  if (p.paidAt && p.dueMinor <= 0) return <Field label="Payment" value={`Paid ${fmtDate(p.paidAt, snap)}`} ink={ink} />;
  return p.dueMinor > 0 ? <Field label="Payment" value={`Due ${money(p.dueMinor, snap.shop.currency)}`} ink={ink} /> : null;
}

function CoverFooter({ snap }: { snap: ReportSnapshot }) {
  return (
    <View
      style={{
        position: 'absolute',
        bottom: 24,
        left: MARGIN,
        right: MARGIN,
        fontSize: 8.5,
        color: MUTED,
        flexDirection: 'row',
        justifyContent: 'space-between',
      }}
    >
      <Text>{snap.shop.contact}</Text>
      <Text render={({ pageNumber, totalPages }) => `Job ${snap.job.number} · Page ${pageNumber} of ${totalPages}`} />
    </View>
  );
}

function Field({ label, value, sub, ink }: { label: string; value: string; sub?: string; ink: string }) {
  return (
    <View style={{ marginBottom: 14 }}>
      <Text style={{ fontSize: 8.5, color: ink, fontWeight: 600, letterSpacing: 0.8 }}>{label.toUpperCase()}</Text>
      {value ? <Text style={{ fontSize: 15, fontWeight: 600 }}>{value}</Text> : null}
      {sub ? <Text style={{ color: MUTED }}>{sub}</Text> : null}
    </View>
  );
}
