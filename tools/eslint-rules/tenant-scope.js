// Fails when a tenant model (any model with a company_id column) is queried directly instead of
// through `scoped(ctx, Model)`, which injects `company_id = ctx.companyId` into every statement.
// The one way out is a function named `unsafe…` with a comment above it saying why the lookup
// cannot be company-scoped (for example: it builds the tenant context itself).

/** Every static Sequelize method that reads or writes rows. */
const queryMethods = new Set([
  'aggregate',
  'build',
  'bulkBuild',
  'bulkCreate',
  'count',
  'create',
  'decrement',
  'destroy',
  'findAll',
  'findAndCountAll',
  'findByPk',
  'findCreateFind',
  'findOne',
  'findOrBuild',
  'findOrCreate',
  'increment',
  'max',
  'min',
  'restore',
  'sum',
  'truncate',
  'update',
  'upsert',
]);

/** @typedef {import('eslint').Rule.Node} Node */

/**
 * The name a function is known by: its own, or that of the variable, property or method it is
 * assigned to (arrow functions and function expressions have none of their own).
 * @param {Node} fn
 * @returns {string | null}
 */
function functionName(fn) {
  if (fn.type === 'FunctionDeclaration' || fn.type === 'FunctionExpression') {
    if (fn.id) return fn.id.name;
  }
  const parent = fn.parent;
  if (parent?.type === 'VariableDeclarator' && parent.id.type === 'Identifier')
    return parent.id.name;
  if (parent?.type === 'Property' || parent?.type === 'MethodDefinition') {
    if (!parent.computed && parent.key.type === 'Identifier') return parent.key.name;
  }
  return null;
}

/**
 * The node whose leading comment documents a function: the export statement or variable
 * declaration around it when there is one, the function itself otherwise.
 * @param {Node} fn
 * @returns {Node}
 */
function documentedNode(fn) {
  let node = fn;
  for (const wrapper of ['VariableDeclarator', 'VariableDeclaration', 'ExportNamedDeclaration']) {
    if (node.parent?.type === wrapper) node = node.parent;
  }
  if (node.parent?.type === 'Property' || node.parent?.type === 'MethodDefinition') {
    node = node.parent;
  }
  return node;
}

/**
 * The innermost function around `node` whose name starts with `prefix`, if any.
 * @param {Node} node
 * @param {string} prefix
 * @returns {Node | null}
 */
function enclosingUnsafeFunction(node, prefix) {
  for (let at = node.parent; at; at = at.parent) {
    const isFunction =
      at.type === 'FunctionDeclaration' ||
      at.type === 'FunctionExpression' ||
      at.type === 'ArrowFunctionExpression';
    if (isFunction && (functionName(at)?.startsWith(prefix) ?? false)) return at;
  }
  return null;
}

/** @type {import('eslint').Rule.RuleModule} */
export const tenantScopeRule = {
  meta: {
    type: 'problem',
    docs: {
      description:
        'Tenant models are queried only through scoped(ctx, Model), or inside an unsafe… function with a reason',
    },
    schema: [
      {
        type: 'object',
        properties: {
          models: { type: 'array', items: { type: 'string' }, uniqueItems: true },
          unsafePrefix: { type: 'string' },
        },
        required: ['models'],
        additionalProperties: false,
      },
    ],
    messages: {
      direct:
        '{{model}}.{{method}}() skips tenant scoping: use scoped(ctx, {{model}}), or move the lookup into a function named {{prefix}}… with a comment saying why it cannot be scoped.',
      unsafeWithoutReason:
        '{{name}} queries {{model}} unscoped: put a comment above it saying why it cannot be company-scoped.',
    },
  },
  create(context) {
    const options = /** @type {{ models: string[]; unsafePrefix?: string }} */ (context.options[0]);
    const models = new Set(options.models);
    const prefix = options.unsafePrefix ?? 'unsafe';
    const sourceCode = context.sourceCode;

    return {
      CallExpression(node) {
        const callee = node.callee;
        if (callee.type !== 'MemberExpression' || callee.object.type !== 'Identifier') return;
        const model = callee.object.name;
        if (!models.has(model)) return;
        const method =
          !callee.computed && callee.property.type === 'Identifier'
            ? callee.property.name
            : callee.property.type === 'Literal'
              ? String(callee.property.value)
              : null;
        if (method === null || !queryMethods.has(method)) return;

        const unsafeFn = enclosingUnsafeFunction(node, prefix);
        if (!unsafeFn) {
          context.report({ node, messageId: 'direct', data: { model, method, prefix } });
          return;
        }
        if (sourceCode.getCommentsBefore(documentedNode(unsafeFn)).length === 0) {
          context.report({
            node,
            messageId: 'unsafeWithoutReason',
            data: { name: functionName(unsafeFn) ?? prefix, model },
          });
        }
      },
    };
  },
};
