import type { ComponentType } from 'react';
import { can, type Action, type Role } from '@seamwright/shared';
import { CustomersIcon, SettingsIcon, TodayIcon } from '../../../components/ui/icons';
import { LayoutIcon } from '../../../components/ui/layout-icon';
import { paths } from '../../../config/paths';

export interface Section {
  to: string;
  label: string;
  Icon: ComponentType<{ className?: string }>;
  /** The section is shown only to roles that may do this. */
  needs?: Action;
  /** Roles whose phone bottom bar carries this section. */
  phoneRoles: readonly Role[];
}

/** Only sections that exist are listed; later work adds Jobs, Calendar, Inventory, Invoices, Reports. */
const sections: Section[] = [
  {
    to: paths.today,
    label: 'Today',
    Icon: TodayIcon,
    phoneRoles: ['owner', 'office', 'bookkeeper', 'crew_lead'],
  },
  {
    to: paths.customers,
    label: 'Customers',
    Icon: CustomersIcon,
    needs: 'customers.read',
    phoneRoles: ['owner', 'office', 'bookkeeper'],
  },
  // Shows no prices, so every role sees it in the rail; the crew lead's phone bar stays for site work.
  {
    to: paths.layout,
    label: 'Layout',
    Icon: LayoutIcon,
    phoneRoles: ['owner', 'office', 'bookkeeper'],
  },
  {
    to: paths.settings,
    label: 'Settings',
    Icon: SettingsIcon,
    phoneRoles: ['owner', 'office', 'bookkeeper'],
  },
];

export function sectionsFor(role: Role): Section[] {
  return sections.filter((section) => !section.needs || can(role, section.needs));
}

export function phoneSectionsFor(role: Role): Section[] {
  return sectionsFor(role).filter((section) => section.phoneRoles.includes(role));
}
