import type { ReactNode } from 'react';
import { readableTextOn } from '@benchproof/domain';
import { emailKit } from './email-kit';
import { contactLines, type ShopBrand } from './layout';

const MUTED = '#4a4f55';
const paragraph = { margin: '0 0 14px', fontSize: '16px', lineHeight: '24px' };

/**
 * The frame every message shares: a header bar in the shop's primary colour whose text colour comes
 * from the WCAG contrast rule in libs/domain, the body, then the shop's contact lines.
 * Inline styles only (react-email writes them inline): many mail clients drop <style> blocks.
 */
export function MailFrame({ shop, title, preview, children }: { shop: ShopBrand; title: string; preview: string; children: ReactNode }) {
  const { Html, Head, Preview, Body, Container, Section, Text } = emailKit();
  const ink = readableTextOn(shop.brandPrimary);
  const contact = contactLines(shop);
  return (
    <Html lang="en">
      <Head>
        <title>{title}</title>
      </Head>
      <Preview>{preview}</Preview>
      <Body style={{ margin: 0, padding: 0, backgroundColor: '#f3f4f3', fontFamily: 'Arial,Helvetica,sans-serif', color: '#1b1f23' }}>
        <Container style={{ maxWidth: '600px', backgroundColor: '#ffffff' }}>
          <Section style={{ backgroundColor: shop.brandPrimary, color: ink, padding: '16px 20px' }}>
            <Text style={{ margin: 0, fontSize: '20px', lineHeight: '28px', fontWeight: 'bold', color: ink }}>{shop.name}</Text>
          </Section>
          <Section style={{ padding: '20px' }}>{children}</Section>
          <Section style={{ padding: '16px 20px', borderTop: '1px solid #dddddd' }}>
            {contact.map((line) => (
              <Text key={line} style={{ margin: 0, fontSize: '13px', lineHeight: '20px', color: MUTED }}>
                {line}
              </Text>
            ))}
          </Section>
        </Container>
      </Body>
    </Html>
  );
}

/** Each line its own paragraph. */
export function Paragraphs({ lines, small = false }: { lines: readonly string[]; small?: boolean }) {
  const { Text } = emailKit();
  const style = small ? { ...paragraph, fontSize: '13px', lineHeight: '20px', color: MUTED } : paragraph;
  return (
    <>
      {lines.map((line, i) => (
        <Text key={i} style={style}>
          {line}
        </Text>
      ))}
    </>
  );
}

/** A big, easy-to-tap link button in the shop colour (14 px padding around 16 px text: over 44 px tall). */
export function LinkButton({ shop, href, label }: { shop: ShopBrand; href: string; label: string }) {
  const { Button, Section } = emailKit();
  const ink = readableTextOn(shop.brandPrimary);
  return (
    <Section style={{ margin: '4px 0 18px' }}>
      <Button
        href={href}
        style={{
          backgroundColor: shop.brandPrimary,
          color: ink,
          padding: '14px 22px',
          borderRadius: '6px',
          fontWeight: 'bold',
          fontSize: '16px',
          textDecoration: 'none',
        }}
      >
        {label}
      </Button>
    </Section>
  );
}
