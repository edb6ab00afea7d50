/**
 * The OpenAPI 3.1 document of API v1, generated from the same zod schemas the endpoints validate
 * with (zod 4's JSON Schema output, draft 2020-12, which OpenAPI 3.1 uses as its schema dialect).
 */
import { z } from 'zod';
import { ENGINE_VERSION } from '../hydraulics/constants';
import { MAX_BODY_BYTES } from './body';
import { DEFAULT_RATE_LIMIT_PER_MINUTE } from './rate-limit';
import { apiRegistry } from './schema-registry';
import './schemas-drain';
import { waterQuerySchema } from './schemas-requests';
import './schemas-responses';

type Json = Record<string, unknown>;
const ref = (id: string): Json => ({ $ref: `#/components/schemas/${id}` });

function components(): Record<string, Json> {
  const out = z.toJSONSchema(apiRegistry, {
    uri: (id) => `#/components/schemas/${id}`,
    io: 'input',
    metadata: apiRegistry,
  }).schemas as Record<string, Json>;
  for (const schema of Object.values(out)) {
    delete schema.$schema;
    delete schema.$id;
  }
  return out;
}

const errorAnswer = (description: string): Json => ({
  description,
  content: { 'application/json': { schema: ref('Error') } },
});

const limitAnswers: Json = {
  '405': errorAnswer('Wrong method (see the Allow header)'),
  '429': {
    ...errorAnswer('Over the rate limit'),
    headers: { 'Retry-After': { schema: { type: 'integer' }, description: 'Seconds to wait' } },
  },
};

function calc(summary: string, request: string, result: string): Json {
  return {
    post: {
      summary,
      requestBody: { required: true, content: { 'application/json': { schema: ref(request) } } },
      responses: {
        '200': { description: 'Result', content: { 'application/json': { schema: ref(result) } } },
        '400': errorAnswer(
          'Invalid input: malformed JSON, wrong type, missing or unknown field, value out of ' +
            'range (the schema’s bounds), or, never expected, inputs that give no finite result',
        ),
        '413': errorAnswer(`Body over ${MAX_BODY_BYTES / 1024} KiB`),
        '415': errorAnswer('Body is not JSON'),
        ...limitAnswers,
      },
    },
  };
}

function read(summary: string, result: string, parameters: Json[] = []): Json {
  const ok = { description: 'Result', content: { 'application/json': { schema: ref(result) } } };
  const bad = parameters.length ? { '400': errorAnswer('Invalid query') } : {};
  return { get: { summary, parameters, responses: { '200': ok, ...bad, ...limitAnswers } } };
}

function waterParameters(): Json[] {
  return Object.entries(waterQuerySchema.shape).map(([name, schema]) => {
    const json = z.toJSONSchema(schema, { io: 'input', metadata: apiRegistry }) as Json;
    delete json.$schema;
    return { name, in: 'query', required: false, description: json.description, schema: json };
  });
}

let cached: Json | undefined;

/** The document; `origin` becomes its server URL. */
export function openApiDocument(origin: string): Json {
  cached ??= {
    openapi: '3.1.0',
    info: {
      title: 'Drainwright calculation API',
      version: '1.0.0',
      description:
        'Gravity lines, siphons and drain-downs. SI units, each named in its field; g = 9.80665 m/s². ' +
        `Anonymous use, rate-limited per client address (default ${DEFAULT_RATE_LIMIT_PER_MINUTE}/min). ` +
        'Unknown fields are rejected.',
      'x-engine-version': ENGINE_VERSION,
    },
    paths: {
      '/api/v1/line': calc('Gravity line: flow and losses', 'LineRequest', 'LineResult'),
      '/api/v1/siphon': calc(
        'Siphon: flow, crest pressure, verdict',
        'SiphonRequest',
        'SiphonResult',
      ),
      '/api/v1/drain': calc('Drain-down: time and level curve', 'DrainRequest', 'DrainResult'),
      '/api/v1/water': read(
        'Water properties and air pressure',
        'WaterProperties',
        waterParameters(),
      ),
      '/api/v1/catalog': read('Materials, fittings and sizes', 'Catalog'),
      '/api/v1/openapi.json': {
        get: { summary: 'This document', responses: { '200': { description: 'OpenAPI 3.1' } } },
      },
    },
    components: { schemas: components() },
  };
  return { ...cached, servers: [{ url: origin }] };
}
