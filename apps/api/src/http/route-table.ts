// Every API route is declared through this table, which (1) applies the access rule and the
// permission check in one place and (2) keeps a list the tenant-isolation test compares
// against its own, so a new route cannot skip the isolation review.
import { Router } from 'express';
import type { RequestHandler } from 'express';
import type { Action } from '@seamwright/shared';
import { routeInputs } from './route-inputs.js';
import type { RouteInputs } from './route-inputs.js';
import { requirePermission, requireSignedIn, requireTenant } from './tenant-context.js';

export type HttpMethod = 'get' | 'post' | 'patch' | 'put' | 'delete';

/**
 * `public`: anyone; `tenant`: a signed-in member of the active company; `signed-in`: a signed-in
 * person with or without an active company (only to list and choose their companies).
 */
export type Access = 'public' | 'tenant' | 'signed-in';

export interface RouteEntry {
  method: HttpMethod;
  /** Full path including `/api`, in Express syntax (`/api/customers/:id`). */
  path: string;
  access: Access;
  permission: Action | null;
  /** The schemas its handler parses input with (route-inputs.ts), or null when not declared. */
  inputs: RouteInputs | null;
}

export interface RouteOptions {
  access: Access;
  permission?: Action;
  /** `multipart`: a file upload (multipart/form-data); every other write takes JSON. */
  body?: 'json' | 'multipart';
}

export class RouteTable {
  readonly router = Router();
  readonly entries: RouteEntry[] = [];
  /** Router-relative paths of the upload routes, for `createRequireJsonBody`. */
  readonly multipartPaths: string[] = [];

  constructor(private readonly prefix: string) {}

  add(
    method: HttpMethod,
    path: string,
    options: RouteOptions,
    ...handlers: RequestHandler[]
  ): void {
    const chain: RequestHandler[] = [];
    if (options.access === 'tenant') chain.push(requireTenant);
    if (options.access === 'signed-in') chain.push(requireSignedIn);
    if (options.permission) chain.push(requirePermission(options.permission));
    this.router[method](path, ...chain, ...handlers);
    if (options.body === 'multipart') this.multipartPaths.push(path);
    const fullPath = `${this.prefix}${path}`;
    this.entries.push({
      method,
      path: fullPath,
      access: options.access,
      permission: options.permission ?? null,
      inputs: routeInputs[`${method} ${fullPath}`] ?? null,
    });
  }
}
