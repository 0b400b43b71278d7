import { SetupRequestSchema, SignupRequestSchema, type NewShop, type SignInStep, type SetupRequest, type UnitSystem } from '@benchproof/contracts';
import { Alert, Button, Fieldset, NumberInput, SegmentedControl, Select, SimpleGrid, Stack, TextInput, useMatches } from '@mantine/core';
import { useForm, type UseFormReturnType } from '@mantine/form';
import { IconAlertTriangle, IconBuildingStore } from '@tabler/icons-react';
import { ApiError } from '../../../lib/api-client';
import { LOCALE_FROM_CURRENCY, localeChoices } from '../../../lib/dates';
import { contractResolver, formFailure, pathTable, showServerFieldErrors } from '../../../lib/form';
import { useSetUp, useSignUp } from '../api/accounts';
import { NewPasswordInput, weakPasswordMessage } from './new-password-input';

export interface SetupValues {
  code: string;
  shopName: string;
  address: string;
  phone: string;
  shopEmail: string;
  currency: string;
  /** 'auto' follows the currency (stored as null), as on the settings screen. */
  locale: string;
  units: UnitSystem;
  taxRatePct: number | string;
  labourRate: number | string;
  managerName: string;
  managerEmail: string;
  password: string;
}

const EMPTY: SetupValues = {
  code: '',
  shopName: '',
  address: '',
  phone: '',
  shopEmail: '',
  currency: 'GBP',
  locale: LOCALE_FROM_CURRENCY,
  units: 'metric',
  taxRatePct: 20,
  labourRate: 60,
  managerName: '',
  managerEmail: '',
  password: '',
};

const CURRENCIES = ['GBP', 'EUR', 'USD', 'CAD', 'AUD', 'NZD', 'CHF', 'SEK', 'NOK', 'DKK', 'PLN', 'CZK', 'JPY'];

const toRequest = (v: SetupValues): SetupRequest => ({
  code: v.code,
  shop: {
    name: v.shopName,
    address: v.address,
    phone: v.phone,
    email: v.shopEmail,
    currency: v.currency,
    locale: v.locale === LOCALE_FROM_CURRENCY ? null : (v.locale as NewShop['locale']),
    units: v.units,
    taxRateBp: Math.round(Number(v.taxRatePct) * 100),
    labourRateMinor: Math.round(Number(v.labourRate) * 100),
  },
  manager: { name: v.managerName, email: v.managerEmail, password: v.password },
});

const FIELDS = pathTable({
  'shop.name': 'shopName',
  'shop.address': 'address',
  'shop.phone': 'phone',
  'shop.email': 'shopEmail',
  'shop.locale': 'locale',
  'shop.taxRateBp': 'taxRatePct',
  'shop.labourRateMinor': 'labourRate',
  'manager.name': 'managerName',
  'manager.email': 'managerEmail',
  'manager.password': 'password',
});

type Form = UseFormReturnType<SetupValues>;

function WorkshopFields({ form }: { form: Form }) {
  // The two unit systems do not fit side by side on a phone: stacked there.
  const orientation = useMatches<'vertical' | 'horizontal'>({ base: 'vertical', xs: 'horizontal' });
  return (
    <Fieldset legend="Your workshop">
      <Stack>
        <TextInput label="Workshop name" size="lg" {...form.getInputProps('shopName')} />
        <TextInput label="Address" size="lg" {...form.getInputProps('address')} />
        <SimpleGrid cols={{ base: 1, xs: 2 }}>
          <TextInput label="Phone" inputMode="tel" size="lg" {...form.getInputProps('phone')} />
          <TextInput label="Workshop e-mail" type="email" size="lg" {...form.getInputProps('shopEmail')} />
        </SimpleGrid>
        {/* One field a row on a phone: three side by side left the currency two letters wide. */}
        <SimpleGrid cols={{ base: 1, xs: 3 }}>
          <Select label="Currency" size="lg" data={CURRENCIES} allowDeselect={false} {...form.getInputProps('currency')} />
          <NumberInput label="Tax rate (%)" size="lg" min={0} max={100} decimalScale={2} {...form.getInputProps('taxRatePct')} />
          <NumberInput label="Labour rate per hour" size="lg" min={0} decimalScale={2} {...form.getInputProps('labourRate')} />
        </SimpleGrid>
        <Select label="Dates written as" size="lg" allowDeselect={false} data={localeChoices(form.getValues().currency)} {...form.getInputProps('locale')} />
        <SegmentedControl
          size="md"
          fullWidth
          orientation={orientation}
          data={[
            { value: 'metric', label: 'Metric (mm, N·m)' },
            { value: 'imperial', label: 'Imperial (in, in·lbf)' },
          ]}
          {...form.getInputProps('units')}
        />
      </Stack>
    </Fieldset>
  );
}

function ManagerFields({ form }: { form: Form }) {
  return (
    <Fieldset legend="You, the first manager">
      <Stack>
        <TextInput label="Your name" size="lg" autoComplete="name" {...form.getInputProps('managerName')} />
        <TextInput label="Your e-mail (you sign in with it)" type="email" size="lg" autoComplete="username" {...form.getInputProps('managerEmail')} />
        <NewPasswordInput {...form.getInputProps('password')} />
      </Stack>
    </Fieldset>
  );
}

/**
 * The first-run form (with the setup code the server printed) or, on a hosted server, the sign-up form
 * (no code; the manager confirms their e-mail first).
 */
export function SetupForm({ mode, onDone }: { mode: 'setup' | 'signup'; onDone: (res: SignInStep | { message: string }) => void }) {
  const setUp = useSetUp();
  const signUp = useSignUp();
  const pending = setUp.isPending || signUp.isPending;
  const error = setUp.error ?? signUp.error;
  const schema = mode === 'setup' ? SetupRequestSchema : SignupRequestSchema;
  const form = useForm<SetupValues>({ initialValues: EMPTY, validate: contractResolver(schema, toRequest, FIELDS) });
  const onError = (e: unknown) => {
    const weak = weakPasswordMessage(e);
    if (weak) form.setFieldError('password', weak);
    else if (e instanceof ApiError && e.code === 'SETUP_CODE_INVALID') form.setFieldError('code', e.message);
    else if (e instanceof ApiError && e.code === 'EMAIL_TAKEN') form.setFieldError('managerEmail', e.message);
    else showServerFieldErrors(form, e, FIELDS);
  };
  const submit = form.onSubmit((v) =>
    mode === 'setup' ? setUp.mutate(toRequest(v), { onSuccess: onDone, onError }) : signUp.mutate(toRequest(v), { onSuccess: onDone, onError }),
  );
  const failure = error instanceof ApiError && ['WEAK_PASSWORD', 'SETUP_CODE_INVALID', 'EMAIL_TAKEN'].includes(error.code) ? null : formFailure(error);
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        {failure && (
          <Alert color="red" variant="light" icon={<IconAlertTriangle />} role="alert">
            {failure}
          </Alert>
        )}
        {mode === 'setup' && (
          <TextInput
            label="Setup code"
            description="Printed in the server’s output when it started (e.g. ABCD-EFGH-JKLM-NPQR)."
            size="lg"
            autoComplete="off"
            {...form.getInputProps('code')}
          />
        )}
        <WorkshopFields form={form} />
        <ManagerFields form={form} />
        <Button type="submit" size="lg" loading={pending} leftSection={<IconBuildingStore />}>
          {mode === 'setup' ? 'Open my workshop' : 'Sign my workshop up'}
        </Button>
      </Stack>
    </form>
  );
}
