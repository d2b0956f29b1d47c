import fc from 'fast-check';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';

/**
 * Property: no request, whatever its body, query string, path ids or signed-in role, makes the
 * server answer 5xx. Every route comes from the OpenAPI document, so a new route is fuzzed too.
 * Runs on the demo data, so real ids of every resource are among the generated ones.
 */
const RUNS = 2_400;
const DEMO_PASSWORD = 'demo-password-for-fuzzing';
const DEMO_ACCOUNTS = ['admin', 'designer', 'reviewer', 'teacher', 'student'];

/** Routes left out: each would end the fuzzing accounts' sessions, not the server. */
const LEFT_OUT = new Set(['POST /api/auth/logout']);

/** Percent-encodes a path value; a lone surrogate goes out as the invalid UTF-8 it would be. */
function encodePathValue(text: string): string {
  try {
    return encodeURIComponent(text);
  } catch {
    return `%ED%A0%80${encodeURIComponent(text.replace(/[\ud800-\udfff]/g, ''))}`;
  }
}

interface Route {
  method: 'get' | 'post' | 'patch' | 'put' | 'delete';
  path: string;
  /** The query parameters the document declares for it. */
  queryNames: string[];
}

interface Operation {
  parameters?: { name: string; in: string }[];
}

describe('fuzzing every route: no 5xx from generated bodies, query strings and ids', () => {
  let testApp: TestApp;
  let routes: Route[];
  let fieldNames: string[];
  const ids = new Set<string>();
  const tokens: (string | null)[] = [null];
  const http = () => request(testApp.app.getHttpServer());

  /** Every `id` found in an answer, at any depth, joins the pool of path values. */
  const collectIds = (value: unknown): void => {
    if (Array.isArray(value)) value.forEach(collectIds);
    else if (value && typeof value === 'object') {
      for (const [key, inner] of Object.entries(value)) {
        if (/^(id|.*Id)$/.test(key) && typeof inner === 'string') ids.add(inner);
        collectIds(inner);
      }
    }
  };

  beforeAll(async () => {
    testApp = await createTestApp({ seedDemo: true, env: { DEMO_PASSWORD } });
    const document = (await http().get('/api/docs-json')).body as {
      paths: Record<string, Record<string, Operation>>;
      components: { schemas: Record<string, { properties?: Record<string, unknown> }> };
    };
    routes = Object.entries(document.paths).flatMap(([path, operations]) =>
      Object.entries(operations)
        .filter(([method]) => !LEFT_OUT.has(`${method.toUpperCase()} ${path}`))
        .map(([method, operation]) => ({
          method: method as Route['method'],
          path,
          queryNames: (operation.parameters ?? [])
            .filter((parameter) => parameter.in === 'query')
            .map((parameter) => parameter.name),
        })),
    );
    fieldNames = [
      ...new Set(
        Object.values(document.components.schemas).flatMap((schema) =>
          Object.keys(schema.properties ?? {}),
        ),
      ),
    ];
    for (const account of DEMO_ACCOUNTS) {
      const signedIn = await http()
        .post('/api/auth/login')
        .send({ email: `${account}@demo.test`, password: DEMO_PASSWORD });
      expect(signedIn.status).toBe(200);
      const token = signedIn.body.accessToken as string;
      tokens.push(token);
      for (const list of ['calculations', 'plans', 'fill-logs', 'classes', 'admin/users']) {
        collectIds((await http().get(`/api/${list}`).set('Authorization', `Bearer ${token}`)).body);
      }
    }
    for (const classId of [...ids]) {
      const examples = await http()
        .get(`/api/classes/${classId}/examples`)
        .set('Authorization', `Bearer ${tokens[4]}`);
      if (examples.status === 200) collectIds(examples.body);
    }
  });

  afterAll(async () => {
    await testApp.close();
  });

  it(`answers ${RUNS} generated requests across every route without a 5xx`, async () => {
    expect(routes.length).toBeGreaterThan(40);
    expect(ids.size).toBeGreaterThan(10);
    const oddText = fc.constantFrom(
      '',
      '0',
      '-1',
      '1e308',
      '99999999999999999999',
      'NaN',
      'null',
      '[]',
      '{}',
      '..',
      '%00',
      '\u0000',
      '\ud800',
      'a'.repeat(5000),
    );
    const pathValue = fc.oneof(
      fc.constantFrom(...ids),
      fc.uuid(),
      fc.integer({ min: -5, max: 1e6 }).map(String),
      fc.string({ minLength: 1, maxLength: 40 }),
      oddText.filter((text) => text.length > 0),
    );
    const leaf = fc.oneof(
      fc.jsonValue({ maxDepth: 3 }),
      oddText,
      fc.double(),
      fc.constantFrom(null, true, [], {}),
    );
    const body = fc.oneof(
      fc.jsonValue({ maxDepth: 5 }),
      fc.dictionary(fc.constantFrom(...fieldNames), leaf, { maxKeys: 8 }),
      // Nearly valid calculation inputs: one field of the lift check replaced by anything.
      fc
        .record({
          field: fc.constantFrom('envelope', 'envelopeMass', 'payloadMassKg', 'gas', 'ambient'),
          value: leaf,
          title: fc.oneof(fc.string(), leaf),
          baseVersion: fc.oneof(fc.integer({ min: -2, max: 5 }), leaf),
        })
        .map(({ field, value, title, baseVersion }) => ({
          title,
          kind: 'lift-check',
          baseVersion,
          inputs: { ...liftCheckInputs(), [field]: value },
        })),
    );
    const numberText = fc.oneof(
      fc.double().map(String),
      fc.bigInt().map(String),
      fc.integer().map(String),
    );
    const queryValue = fc.oneof(
      { arbitrary: oddText, weight: 2 },
      { arbitrary: numberText, weight: 2 },
      { arbitrary: fc.string({ maxLength: 30 }), weight: 1 },
      { arbitrary: fc.array(fc.string({ maxLength: 8 }), { maxLength: 3 }), weight: 1 },
    );
    // Mostly the route's own parameters (an unknown one is refused before anything else runs).
    const queryFor = (route: Route) =>
      fc.dictionary(
        fc.oneof(
          {
            arbitrary: route.queryNames.length
              ? fc.constantFrom(...route.queryNames)
              : fc.constantFrom(...fieldNames),
            weight: 6,
          },
          { arbitrary: fc.constantFrom(...fieldNames), weight: 1 },
          { arbitrary: fc.string({ maxLength: 10 }), weight: 1 },
        ),
        queryValue,
        { maxKeys: 3 },
      );
    const request = fc
      .constantFrom(...routes)
      .chain((route) => fc.tuple(fc.constant(route), queryFor(route)));
    const statuses = new Map<number, number>();
    let sent = 0;

    await fc.assert(
      fc.asyncProperty(
        request,
        fc.array(pathValue, { minLength: 4, maxLength: 4 }),
        body,
        fc.constantFrom(...tokens),
        async ([route, queryValues], values, sentBody, token) => {
          let index = 0;
          const path = route.path.replace(/\{[^}]+\}/g, () =>
            encodePathValue(values[index++] ?? 'x'),
          );
          const search = new URLSearchParams();
          for (const [key, value] of Object.entries(queryValues)) {
            for (const item of [value].flat()) search.append(key, item);
          }
          const url = search.size ? `${path}?${search.toString()}` : path;
          let call = http()[route.method](url);
          if (token) call = call.set('Authorization', `Bearer ${token}`);
          const response =
            route.method === 'get' || route.method === 'delete'
              ? await call
              : await call
                  .set('Content-Type', 'application/json')
                  .send(JSON.stringify(sentBody) ?? 'null');
          sent += 1;
          statuses.set(response.status, (statuses.get(response.status) ?? 0) + 1);
          if (response.status >= 500) {
            throw new Error(
              `${route.method.toUpperCase()} ${url} answered ${response.status}: ${response.text.slice(0, 300)}`,
            );
          }
        },
      ),
      { numRuns: RUNS, endOnFailure: true },
    );
    expect(sent).toBe(RUNS);
    // The generated requests reach the handlers, not only the validation in front of them.
    const succeeded = [...statuses].filter(([status]) => status < 300);
    expect(succeeded.reduce((sum, [, count]) => sum + count, 0)).toBeGreaterThan(50);
  }, 600_000);
});
