import { Document, Page, View } from '@react-pdf/renderer';
import type { PageSize } from '@benchproof/contracts';
import { SCOPE_CAUTION } from '@benchproof/domain';
import type { IssueStamp, ReportImage, ReportSnapshot } from '../report-data';
import { Closing } from './closing.pdf';
import { Cover } from './cover.pdf';
import { Findings, Pairs, ScopeStills, type Images } from './findings.pdf';
import { PageChrome } from './parts.pdf';
import { Measurements, Recommendations, WorkDone } from './records.pdf';
import { Summary } from './summary.pdf';
import { GUTTER, MARGIN, PAGE_POINTS, styles } from './theme';

export interface ReportDocumentProps {
  snap: ReportSnapshot;
  pageSize: PageSize;
  images: Images;
  logo: ReportImage | null;
  /** Null for a draft. */
  stamp: IssueStamp | null;
}

/** The bench report: cover, then one flowing page sequence with the job number and page numbers on every page. */
export function ReportDocument({ snap, pageSize, images, logo, stamp }: ReportDocumentProps) {
  const slot = (PAGE_POINTS[pageSize].width - 2 * MARGIN - GUTTER) / 2;
  const size = pageSize === 'A4' ? 'A4' : 'LETTER';
  return (
    <Document title={`Bench report ${snap.job.number}`} author={snap.shop.name} subject={`Job ${snap.job.number}`} creator="BenchProof" producer="BenchProof">
      <Cover snap={snap} pageSize={pageSize} logo={logo} stamp={stamp} />
      <Page size={size} style={styles.page}>
        <PageChrome shop={snap.shop.name} jobNumber={snap.job.number} draft={!stamp} />
        <View style={styles.body}>
          <Summary snap={snap} />
          <Findings snap={snap} images={images} slot={slot} />
          <Pairs snap={snap} images={images} slot={slot} />
          <Measurements snap={snap} />
          <ScopeStills snap={snap} images={images} slot={slot} caution={SCOPE_CAUTION} />
          <WorkDone snap={snap} />
          <Recommendations snap={snap} />
          <Closing snap={snap} stamp={stamp} />
        </View>
      </Page>
    </Document>
  );
}
