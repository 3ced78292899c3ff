// Everything the estimate document (PDF, the customer's page) needs, read in one place.
import type { AreaView, CautionView, EstimateView } from '@seamwright/shared';
import { ESTIMATE_ROUNDING_RULE } from '@seamwright/domain';
import type { LayoutPlan } from '@seamwright/takeoff';
import type { RequestContext } from '../../context.js';
import { notFound } from '../../errors.js';
import { listAreasOfJob } from '../areas/areas.repository.js';
import { toAreaView } from '../areas/areas.service.js';
import { getTakeoffOfAreas } from '../areas/job-takeoff.service.js';
import { findOwnCompany } from '../company/company.repository.js';
import { findCustomer } from '../customers/customers.repository.js';
import { findJob } from '../jobs/jobs.repository.js';
import { findSite } from '../sites/sites.repository.js';
import { toEstimateView } from './estimate-view.js';
import { findEstimate } from './estimates.repository.js';

export interface EstimateDocument {
  company: {
    name: string;
    address: string | null;
    timeZone: string;
    region: string | null;
    currency: string;
    measurementSystem: 'imperial' | 'metric';
  };
  customer: {
    id: string;
    name: string;
    email: string | null;
    phone: string | null;
    billingAddress: string | null;
  };
  site: {
    id: string;
    label: string | null;
    addressLine1: string;
    addressLine2: string | null;
    city: string;
    region: string | null;
    postalCode: string | null;
  };
  job: { id: string; title: string; status: string };
  estimate: EstimateView;
  /** The areas with their saved plans, for the plan drawing. */
  areas: AreaView<LayoutPlan>[];
  /** The safety cautions over the job's areas. */
  cautions: CautionView[];
  roundingRule: string;
}

/** 404 for another company's estimate. */
export async function getEstimateForDocument(
  ctx: RequestContext,
  estimateId: string,
): Promise<EstimateDocument> {
  const record = await findEstimate(ctx, estimateId);
  if (!record) throw notFound('Estimate');
  const [job, company, areas] = await Promise.all([
    findJob(ctx, record.jobId),
    findOwnCompany(ctx),
    listAreasOfJob(ctx, record.jobId),
  ]);
  if (!job || !company) throw notFound('Estimate');
  const [customer, site, takeoff] = await Promise.all([
    findCustomer(ctx, job.customerId),
    findSite(ctx, job.siteId),
    getTakeoffOfAreas(ctx, record.jobId, areas),
  ]);
  if (!customer || !site) throw notFound('Estimate');
  return {
    company: {
      name: company.name,
      address: company.address,
      timeZone: company.timeZone,
      region: company.region,
      currency: company.currency,
      measurementSystem: company.measurementSystem,
    },
    customer: {
      id: customer.id,
      name: customer.name,
      email: customer.email,
      phone: customer.phone,
      billingAddress: customer.billingAddress,
    },
    site: {
      id: site.id,
      label: site.label,
      addressLine1: site.addressLine1,
      addressLine2: site.addressLine2,
      city: site.city,
      region: site.region,
      postalCode: site.postalCode,
    },
    job: { id: job.id, title: job.title, status: job.status },
    estimate: toEstimateView(record),
    areas: areas.map(toAreaView),
    cautions: takeoff.cautions,
    roundingRule: ESTIMATE_ROUNDING_RULE.sentence,
  };
}
