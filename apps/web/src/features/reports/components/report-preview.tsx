import type { ReportDto } from '@benchproof/contracts';
import { Button, Group, Image, Pagination, SegmentedControl, Stack, Text } from '@mantine/core';
import { useState } from 'react';

/** Whether this browser shows PDFs inline (navigator.pdfViewerEnabled; false on most phones). */
const inlinePdf = (): boolean => typeof navigator !== 'undefined' && navigator.pdfViewerEnabled === true;

/**
 * The real PDF in an <object>, or page images rendered on the server where the
 * browser has no PDF viewer; desk can switch between them.
 */
export function ReportPreview({ report }: { report: ReportDto }) {
  const [mode, setMode] = useState<'pdf' | 'pages'>(inlinePdf() ? 'pdf' : 'pages');
  const [page, setPage] = useState(1);
  if (!report.urls.pdf || !report.urls.pagePng) return null;
  const pages = report.pageCount ?? 1;
  return (
    <Stack gap="xs">
      <Group justify="space-between" wrap="wrap">
        <SegmentedControl
          size="md"
          value={mode}
          onChange={setMode}
          data={[
            { value: 'pdf', label: 'PDF' },
            { value: 'pages', label: 'Page images' },
          ]}
        />
        <Button component="a" href={report.urls.pdf} target="_blank" rel="noopener" variant="light" size="md">
          Open PDF
        </Button>
      </Group>
      {mode === 'pdf' ? (
        <object
          data={report.urls.pdf}
          type="application/pdf"
          aria-label="Report preview"
          style={{ width: '100%', height: '75vh', border: '1px solid var(--mantine-color-gray-4)' }}
        >
          <Text>This browser shows no PDF here. Choose “Page images”.</Text>
        </object>
      ) : (
        <Stack gap="xs" align="center">
          <Image
            src={report.urls.pagePng.replace('{page}', String(page))}
            alt={`Page ${page} of ${pages}`}
            maw={720}
            w="100%"
            fit="contain"
            style={{ border: '1px solid var(--mantine-color-gray-4)' }}
          />
          <Pagination total={pages} value={page} onChange={setPage} />
        </Stack>
      )}
    </Stack>
  );
}
