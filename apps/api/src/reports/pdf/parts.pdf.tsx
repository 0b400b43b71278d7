import { Circle, Image, Path, Polygon, Svg, Text, View } from '@react-pdf/renderer';
import { CONDITION_LABELS, type Condition } from '@benchproof/domain';
import type { ReportImage } from '../report-data';
import { CONDITION_MARK, MUTED, styles } from './theme';

/**
 * Where the ink of a 10 pt Inter line (the body's 1.35 line height) is centred, below the top of its
 * text box: 5.75 pt, measured on pdftoppm renders (report-marks.spec.ts). react-pdf draws the glyphs
 * high in a taller box, so centring the icon on the box put it half a line below its words.
 */
const INK_CENTRE_PT = 5.75;

/** The condition's shape in its colour, then its label: readable in colour and in greyscale. */
export function ConditionMark({ condition, size = 10, label = true }: { condition: Condition; size?: number; label?: boolean }) {
  const { colour, shape } = CONDITION_MARK[condition];
  return (
    <View style={[styles.row, { alignItems: 'flex-start' }]}>
      <Svg width={size} height={size} viewBox="0 0 10 10" style={{ marginTop: INK_CENTRE_PT - size / 2 }}>
        {shape === 'circle' && <Circle cx={5} cy={5} r={4.5} fill={colour} />}
        {shape === 'diamond' && <Polygon points="5,0 10,5 5,10 0,5" fill={colour} />}
        {shape === 'triangle' && <Polygon points="5,0.5 10,9.5 0,9.5" fill={colour} />}
        {shape === 'cross' && (
          <Path
            d="M0 0h10v10h-10z M2 3.2l1.2-1.2 1.8 1.8 1.8-1.8 1.2 1.2-1.8 1.8 1.8 1.8-1.2 1.2-1.8-1.8-1.8 1.8-1.2-1.2 1.8-1.8z"
            fill={colour}
            fillRule="evenodd"
          />
        )}
      </Svg>
      {label && <Text style={{ marginLeft: 4, fontWeight: 600, color: colour }}>{CONDITION_LABELS[condition]}</Text>}
    </View>
  );
}

/** Header and footer on every page but the cover: shop, job number, page x of y. */
export function PageChrome({ shop, jobNumber, draft }: { shop: string; jobNumber: string; draft: boolean }) {
  return (
    <>
      <View
        fixed
        style={{ position: 'absolute', top: 22, left: 40, right: 40, flexDirection: 'row', justifyContent: 'space-between', fontSize: 8.5, color: MUTED }}
      >
        <Text>{shop} · Bench report</Text>
        <Text>
          {draft ? 'DRAFT — not issued · ' : ''}Job {jobNumber}
        </Text>
      </View>
      <View
        fixed
        style={{
          position: 'absolute',
          bottom: 24,
          left: 40,
          right: 40,
          height: 12,
          flexDirection: 'row',
          justifyContent: 'space-between',
          fontSize: 8.5,
          color: MUTED,
        }}
      >
        <Text>Job {jobNumber}</Text>
        <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
      </View>
    </>
  );
}

/**
 * A JPEG as a data URI: react-pdf keys an image by this string, so a shot printed twice is
 * embedded once, without the UTF-8 copy of every JPEG it makes for `{ data, format }` sources
 * (about 20 ms for 40 print JPEGs, twice per render). `cache={false}` keeps react-pdf's
 * module-wide image cache from holding the last 30 photos after the render.
 */
const jpegDataUri = (data: Buffer) => `data:image/jpeg;base64,${data.toString('base64')}`;

/** Fits an image into a slot keeping its aspect; the JPEG bytes go into the PDF untouched. */
export function Shot({ image, width, maxHeight, caption }: { image: ReportImage | undefined; width: number; maxHeight: number; caption?: string }) {
  if (!image) {
    return (
      <View style={{ width, height: 60, borderWidth: 0.5, borderColor: MUTED, justifyContent: 'center', alignItems: 'center' }}>
        <Text style={styles.small}>Photo not available</Text>
      </View>
    );
  }
  let w = width;
  let h = (width * image.height) / image.width;
  if (h > maxHeight) {
    h = maxHeight;
    w = (maxHeight * image.width) / image.height;
  }
  return (
    <View style={{ width }} wrap={false}>
      <Image src={{ uri: jpegDataUri(image.data) }} cache={false} style={{ width: w, height: h }} />
      {caption ? <Text style={[styles.small, { marginTop: 2 }]}>{caption}</Text> : null}
    </View>
  );
}
