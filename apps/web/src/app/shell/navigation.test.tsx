import { ACCESS_POLICY, ROLES, roleCan, type Action, type Role } from '@benchproof/contracts';
import { MantineProvider } from '@mantine/core';
import { cleanup, render, screen } from '@testing-library/react';
import { MemoryRouter } from 'react-router';
import { theme } from '../theme';
import { Navigation } from './navigation';
import { MENU as NAV_ITEMS } from '../route-table';

const managerOnly = (a: Action) => ACCESS_POLICY[a].staff.length === 1 && ACCESS_POLICY[a].staff[0] === 'manager';

function renderFor(role: Role) {
  render(
    <MantineProvider theme={theme}>
      <MemoryRouter>
        <Navigation can={(a) => roleCan(role, a)} onNavigate={() => undefined} />
      </MemoryRouter>
    </MantineProvider>,
  );
  return screen.getAllByRole('link').map((l) => l.textContent);
}

describe('navigation follows ACCESS_POLICY', () => {
  afterEach(cleanup);

  it('never shows a mechanic a manager-only section', () => {
    const hidden = NAV_ITEMS.filter((i) => i.action && managerOnly(i.action)).map((i) => i.label);
    expect(hidden).toEqual(expect.arrayContaining(['Users & roles', 'Shop settings']));
    const shown = renderFor('mechanic');
    for (const label of hidden) expect(shown).not.toContain(label);
    expect(shown).toEqual(['Jobs', 'Customers & bikes']);
  });

  it.each(ROLES)('shows %s exactly the sections the policy lets them open', (role) => {
    const expected = NAV_ITEMS.filter((i) => !i.action || roleCan(role, i.action)).map((i) => i.label);
    expect(renderFor(role)).toEqual(expected);
  });

  it('shows the manager the settings a mechanic cannot open', () => {
    expect(renderFor('manager')).toEqual(expect.arrayContaining(['Users & roles', 'Shop settings']));
  });
});
