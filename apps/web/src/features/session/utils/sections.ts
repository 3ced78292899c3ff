import type { ComponentType } from 'react';
import { can, type Action, type Role } from '@seamwright/shared';
import {
  CalendarIcon,
  CustomersIcon,
  InvoicesIcon,
  JobsIcon,
  ProfileIcon,
  ReportsIcon,
  SettingsIcon,
  StockIcon,
  TodayIcon,
} from '../../../components/ui/icons';
import { LayoutIcon } from '../../../components/ui/layout-icon';
import { paths } from '../../../config/paths';

type Icon = ComponentType<{ className?: string }>;

export interface Section {
  to: string;
  label: string;
  Icon: Icon;
  /** The section is shown only to roles that may do this. */
  needs?: Action;
  /** Roles whose phone bottom bar carries this section. */
  phoneRoles: readonly Role[];
  /** A role that knows this section by another name on the phone (what it holds for them). */
  phoneNames?: Partial<Record<Role, { label: string; Icon: Icon }>>;
}

/** Only sections that exist are listed; later work adds Reports. */
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
  // Crew leads reach their jobs through bookings once the calendar lands (jobs.read excludes them).
  {
    to: paths.jobs,
    label: 'Jobs',
    Icon: JobsIcon,
    needs: 'jobs.read',
    phoneRoles: ['owner', 'office', 'bookkeeper'],
  },
  // Crew leads see their own crews' bookings (no money); bookkeepers have no bookings access.
  // Not on the phone bar yet: the crew lead's day (later work) is their phone view of it.
  {
    to: paths.calendar,
    label: 'Calendar',
    Icon: CalendarIcon,
    needs: 'bookings.read',
    phoneRoles: [],
  },
  // Owners and bookkeepers bill here; the office reads an invoice's status for the customer.
  {
    to: paths.invoices,
    label: 'Invoices',
    Icon: InvoicesIcon,
    needs: 'invoices.read',
    phoneRoles: ['bookkeeper'],
  },
  // Shows no prices, so every role sees it; crew leads check cuts and seams with it on site.
  {
    to: paths.layout,
    label: 'Layout',
    Icon: LayoutIcon,
    phoneRoles: ['owner', 'office', 'bookkeeper', 'crew_lead'],
  },
  // No money in it, so every role reads it; crew leads check lots and lengths from the yard.
  {
    to: paths.stock,
    label: 'Stock',
    Icon: StockIcon,
    needs: 'inventory.read',
    phoneRoles: ['crew_lead'],
  },
  // Receivables and exports for the bookkeeper, and the dashboard too for the owner; desktop
  // only (wide tables and charts).
  {
    to: paths.reports,
    label: 'Reports',
    Icon: ReportsIcon,
    needs: 'receivables.read',
    phoneRoles: [],
  },
  // For a crew lead the settings page holds only their own profile, so the phone bar says so.
  {
    to: paths.settings,
    label: 'Settings',
    Icon: SettingsIcon,
    phoneRoles: ['owner', 'office', 'bookkeeper', 'crew_lead'],
    phoneNames: { crew_lead: { label: 'Profile', Icon: ProfileIcon } },
  },
];

export function sectionsFor(role: Role): Section[] {
  return sections.filter((section) => !section.needs || can(role, section.needs));
}

/**
 * The phone bottom bar. Until crews have their scheduled jobs (and with them the gate and
 * hazard notes of the sites they work on), a crew lead's bar reaches Today, Layout, Stock and Profile.
 */
export function phoneSectionsFor(role: Role): Section[] {
  return sectionsFor(role)
    .filter((section) => section.phoneRoles.includes(role))
    .map((section) => ({ ...section, ...section.phoneNames?.[role] }));
}
