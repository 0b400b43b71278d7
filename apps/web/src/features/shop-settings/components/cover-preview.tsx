import { isDomainInputError, reportPalette, type ReportPalette } from '@benchproof/domain';
import { Box, Image, Paper, Text } from '@mantine/core';

interface Props {
  name: string;
  primary: string;
  accent: string;
  logoUrl: string | null;
  pageSize: 'A4' | 'Letter';
}

const palette = (p: string, a: string): ReportPalette | null => {
  try {
    return reportPalette(p, a);
  } catch (e) {
    if (!isDomainInputError(e)) throw e;
    return null;
  }
};

/** A small live picture of the report cover, using the same colour decisions as the PDF. */
export function CoverPreview({ name, primary, accent, logoUrl, pageSize }: Props) {
  const p = palette(primary, accent);
  if (!p) return null;
  // Page proportions: A4 210 × 297 mm (ISO 216), Letter 8.5 × 11 in.
  const ratio = pageSize === 'A4' ? 297 / 210 : 11 / 8.5;
  const width = 220;
  return (
    <Paper withBorder shadow="xs" w={width} h={width * ratio} style={{ overflow: 'hidden', flexShrink: 0 }} aria-label="Cover preview">
      <Box bg={p.primary.background} h="42%" px={14} pt={14} c={p.primary.text}>
        {logoUrl && (
          <Box bg="#fff" p={4} mb={8} style={{ display: 'inline-block', borderRadius: 3 }}>
            <Image src={logoUrl} h={22} w="auto" fit="contain" alt="Shop logo" />
          </Box>
        )}
        <Text fz={9} fw={600}>
          {name || 'Your shop'}
        </Text>
        <Text fz={18} fw={700} lh={1.1}>
          Bench report
        </Text>
        <Text fz={10}>Job J-2026-0042</Text>
      </Box>
      <Box bg={p.accent.background} h={5} />
      <Box px={14} pt={10}>
        <Text fz={7} fw={600} c={p.primaryInk.used} style={{ letterSpacing: 0.6 }}>
          BIKE
        </Text>
        <Text fz={10} fw={600}>
          Quillon Works Stratus 11
        </Text>
        <Text fz={7} fw={600} c={p.primaryInk.used} mt={6} style={{ letterSpacing: 0.6 }}>
          OWNER
        </Text>
        <Text fz={10} fw={600}>
          Zsófia Kőrösi-Łęcka
        </Text>
      </Box>
    </Paper>
  );
}
