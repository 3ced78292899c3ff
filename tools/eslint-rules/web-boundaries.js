// The import zones of apps/web/src (see DEVELOPERS.md): app/ routes compose features; a feature
// never imports another feature or app/; components/, lib/ and config/ import no feature and no
// app/. Checked by eslint-plugin-import-x's no-restricted-paths on resolved file paths.
import { readdirSync } from 'node:fs';
import path from 'node:path';

const composeInRoute = 'Features do not import each other: compose them in an app/ route.';

/**
 * One zone per feature folder, read from disk so that a new feature is covered by itself.
 * @param {string} webSrc the web app's src folder, relative to the lint root
 * @param {string} root the lint root (where eslint.config.js is)
 */
export function webBoundaryZones(webSrc, root) {
  const features = readdirSync(path.join(root, webSrc, 'features'), { withFileTypes: true })
    .filter((entry) => entry.isDirectory())
    .map((entry) => entry.name);
  return [
    ...features.map((feature) => ({
      target: `./${webSrc}/features/${feature}`,
      from: `./${webSrc}/features`,
      except: [`./${feature}`],
      message: composeInRoute,
    })),
    {
      target: `./${webSrc}/features`,
      from: `./${webSrc}/app`,
      message: 'Features do not import app/: the routes import features, not the other way.',
    },
    {
      target: [`./${webSrc}/components`, `./${webSrc}/lib`, `./${webSrc}/config`],
      from: [`./${webSrc}/features`, `./${webSrc}/app`],
      message: 'Shared code (components/, lib/, config/) imports no feature and no app/ module.',
    },
  ];
}
