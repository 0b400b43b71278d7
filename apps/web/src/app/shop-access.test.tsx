import { ROLES, type Role } from '@benchproof/contracts';
import { MantineProvider } from '@mantine/core';
import { cleanup, render, screen } from '@testing-library/react';
import { MemoryRouter } from 'react-router';
import { Navigation } from './shell/navigation';
import { shopCan } from './shop-access';
import { theme } from './theme';

function linksFor(role: Role, showcaseDeskAccess: boolean | undefined) {
  render(
    <MantineProvider theme={theme}>
      <MemoryRouter>
        <Navigation can={shopCan(role, showcaseDeskAccess === undefined ? undefined : { showcaseDeskAccess })} onNavigate={() => undefined} />
      </MemoryRouter>
    </MantineProvider>,
  );
  return screen.getAllByRole('link').map((l) => l.textContent);
}

describe('the shop narrows the policy: desk reaches the showcase only where the shop allows it', () => {
  afterEach(cleanup);

  it.each([
    ['manager', false, true],
    ['manager', true, true],
    ['desk', false, false],
    ['desk', true, true],
    ['mechanic', true, false],
  ] as const)('%s with desk access %s: showcase %s', (role, on, expected) => {
    expect(shopCan(role, { showcaseDeskAccess: on })('showcase.view')).toBe(expected);
    expect(linksFor(role, on).includes('Showcase')).toBe(expected);
  });

  it('hides it from the desk until the shop settings have loaded; a manager sees it at once', () => {
    expect(linksFor('desk', undefined)).not.toContain('Showcase');
    cleanup();
    expect(linksFor('manager', undefined)).toContain('Showcase');
  });

  it('leaves every other action to the policy', () => {
    for (const role of ROLES) expect(shopCan(role, { showcaseDeskAccess: true })('shop.edit')).toBe(role === 'manager');
  });
});
