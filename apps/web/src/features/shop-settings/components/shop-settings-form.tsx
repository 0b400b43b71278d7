import { UpdateShopSettingsRequestSchema, type ShopSettingsDto } from '@benchproof/contracts';
import { DEFAULT_CHAIN_LIMIT_POLICY, majorTextToMinor, minorToMajorText } from '@benchproof/domain';
import {
  Alert,
  Button,
  ColorInput,
  Group,
  NumberInput,
  Paper,
  SegmentedControl,
  Select,
  SimpleGrid,
  Stack,
  Switch,
  Text,
  Textarea,
  TextInput,
  Title,
} from '@mantine/core';
import { useForm, type UseFormReturnType } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import type { ReactNode } from 'react';
import { localeChoices } from '../../../lib/dates';
import { formFailure, showServerFieldErrors } from '../../../lib/form';
import { useUpdateShopSettings } from '../api/shop-settings';
import { ChainLimitFields } from './chain-limit-fields';
import { ContrastCheck } from './contrast-check';
import { CoverPreview } from './cover-preview';
import { LogoUpload } from './logo-upload';
import { ReceiptFields } from './receipt-fields';
import { fromDto, toFormPath, toRequest, validateSettings, type SettingsValues } from './settings-values';
import { ShowcaseAccessSection } from './showcase-access-section';

type Form = UseFormReturnType<SettingsValues>;

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Paper withBorder p="md">
      <Stack gap="sm">
        <Title order={3} size="h4">
          {title}
        </Title>
        {children}
      </Stack>
    </Paper>
  );
}

function MoneySection({ form }: { form: Form }) {
  return (
    <Section title="Rates">
      <SimpleGrid cols={{ base: 1, sm: 3 }} spacing="sm">
        <TextInput label={`Labour rate per hour (${form.getValues().currency})`} inputMode="decimal" {...form.getInputProps('labourRate')} />
        <NumberInput label="Tax rate" suffix=" %" inputMode="decimal" min={0} max={100} step={0.5} decimalScale={2} {...form.getInputProps('taxRatePct')} />
        <TextInput
          label="Currency"
          description="ISO code, e.g. GBP, EUR"
          maxLength={3}
          {...form.getInputProps('currency')}
          onChange={(e) => form.setFieldValue('currency', e.currentTarget.value.toUpperCase())}
        />
      </SimpleGrid>
      <Select
        label="Dates written as"
        description="On every screen, e-mail and report, and in date pickers"
        allowDeselect={false}
        data={localeChoices(form.getValues().currency)}
        {...form.getInputProps('locale')}
      />
    </Section>
  );
}

function WorkshopSection({ form }: { form: Form }) {
  const v = form.getValues();
  return (
    <Section title="Workshop rules">
      <Text size="sm" fw={500}>
        Units
      </Text>
      <SegmentedControl
        size="md"
        data={[
          { value: 'metric', label: 'Metric (mm)' },
          { value: 'imperial', label: 'Imperial (in)' },
        ]}
        {...form.getInputProps('units')}
      />
      <Text size="sm" fw={500}>
        Report page size
      </Text>
      <SegmentedControl size="md" data={['A4', 'Letter']} {...form.getInputProps('pageSize')} />
      <Switch
        size="lg"
        label="Final check needs a second person (not the job's mechanic)"
        {...form.getInputProps('finalCheckSecondPerson', { type: 'checkbox' })}
      />
      <Switch size="lg" label="Use our own chain limits" {...form.getInputProps('ownChainLimits', { type: 'checkbox' })} />
      {v.ownChainLimits && <ChainLimitFields form={form} />}
      <Text size="sm" c="dimmed">
        Defaults: {DEFAULT_CHAIN_LIMIT_POLICY.replaceAt11Pct} % for 11/12-speed, {DEFAULT_CHAIN_LIMIT_POLICY.replaceAt10Pct} % for 10-speed and below, cassette
        at {DEFAULT_CHAIN_LIMIT_POLICY.cassettePct} %. These are common workshop practice; the chain maker's instructions govern.
      </Text>
    </Section>
  );
}

function BrandSection({ form, settings }: { form: Form; settings: ShopSettingsDto }) {
  const v = form.getValues();
  return (
    <Section title="Branding and contact">
      <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
        <TextInput label="Shop name" {...form.getInputProps('name')} />
        <TextInput label="Phone" inputMode="tel" {...form.getInputProps('phone')} />
        <TextInput label="E-mail" inputMode="email" {...form.getInputProps('email')} />
        <Textarea label="Address" autosize minRows={2} {...form.getInputProps('address')} />
      </SimpleGrid>
      <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="md">
        <Stack gap="xs">
          <ColorInput label="Primary colour" format="hex" {...form.getInputProps('brandPrimary')} />
          <ContrastCheck colour={v.brandPrimary} />
        </Stack>
        <Stack gap="xs">
          <ColorInput label="Accent colour" format="hex" {...form.getInputProps('brandAccent')} />
          <ContrastCheck colour={v.brandAccent} />
        </Stack>
      </SimpleGrid>
      <Textarea label="Report footer" autosize minRows={2} {...form.getInputProps('reportFooter')} />
      <Group align="flex-start" gap="xl" wrap="wrap">
        <LogoUpload settings={settings} />
        <Stack gap={4}>
          <Text fw={600} size="sm">
            Cover preview
          </Text>
          <CoverPreview name={v.name} primary={v.brandPrimary} accent={v.brandAccent} logoUrl={settings.logo?.url ?? null} pageSize={v.pageSize} />
        </Stack>
      </Group>
    </Section>
  );
}

/** The manager's settings: rates, units, the final-check rule, chain limits and branding. */
export function ShopSettingsForm({ settings }: { settings: ShopSettingsDto }) {
  const update = useUpdateShopSettings();
  const form = useForm<SettingsValues>({
    mode: 'controlled',
    initialValues: fromDto(settings, minorToMajorText),
    validate: validateSettings(majorTextToMinor),
  });
  const submit = form.onSubmit((v) =>
    update.mutate(UpdateShopSettingsRequestSchema.parse(toRequest(v, majorTextToMinor)), {
      onSuccess: () => notifications.show({ color: 'teal', message: 'Settings saved.' }),
      onError: (e) => showServerFieldErrors(form, e, toFormPath),
    }),
  );
  const failure = formFailure(update.error);
  return (
    <form onSubmit={submit} noValidate>
      <Stack maw={900}>
        <MoneySection form={form} />
        <ReceiptFields form={form} settings={settings} />
        <WorkshopSection form={form} />
        <BrandSection form={form} settings={settings} />
        <ShowcaseAccessSection form={form} />
        {failure && <Alert color="red">{failure}</Alert>}
        {Object.keys(form.errors).length > 0 && (
          <Alert color="red" variant="light">
            Some fields need attention; nothing you typed is lost.
          </Alert>
        )}
        <Button type="submit" size="lg" loading={update.isPending}>
          Save settings
        </Button>
      </Stack>
    </form>
  );
}
