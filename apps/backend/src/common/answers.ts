import {
  applyDecorators,
  HttpCode,
  Post,
  RequestMethod,
  SetMetadata,
  type INestApplication,
} from '@nestjs/common';
import { HTTP_CODE_METADATA, METHOD_METADATA } from '@nestjs/common/constants';
import { ModulesContainer } from '@nestjs/core';
import { ApiProduces, ApiResponse, DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import type { OpenAPIObject } from '@nestjs/swagger';
import type { ResponseName } from '@gaugeproof/api-types';

const ANSWERS = 'gaugeproof:answers';

/** What a route answers: a named shape of the contract, a file of a type, or nothing (204). */
export type Answer =
  { shape: ResponseName; alsoStatus?: number } | { file: string } | { empty: true };

/**
 * Names a route's answer for the OpenAPI document: `@Answers('LotDetail')` (a response shape
 * of `libs/api-types`), `@Answers.file('text/csv')`, `@Answers.empty()`. Every route names
 * one (test/routes.e2e-spec.ts), and the API tests check each JSON answer against it.
 */
export const Answers = Object.assign(
  /** `alsoStatus`: a second success status the route may answer with the same shape. */
  (shape: ResponseName, alsoStatus?: number) =>
    SetMetadata(ANSWERS, { shape, alsoStatus } satisfies Answer),
  {
    file: (contentType: string) => SetMetadata(ANSWERS, { file: contentType } satisfies Answer),
    empty: () => SetMetadata(ANSWERS, { empty: true } satisfies Answer),
  },
);

/**
 * A POST that acts on a record that exists (ship a return, approve a concession, revoke a
 * record's links): nothing is created, so it answers 200 (not POST's 201) with `shape`.
 */
export const PostAction = (path: string, shape: ResponseName) =>
  applyDecorators(Post(path), HttpCode(200), Answers(shape));

/** The answer a handler names, if any. */
export function answerOf(handler: object): Answer | undefined {
  return Reflect.getMetadata(ANSWERS, handler) as Answer | undefined;
}

/** Puts each route's named answer into Swagger's metadata, with the status the route answers. */
function describeAnswers(app: INestApplication): void {
  for (const module of app.get(ModulesContainer).values()) {
    for (const wrapper of module.controllers.values()) {
      const proto = wrapper.metatype?.prototype as Record<string, unknown> | undefined;
      if (!proto) continue;
      for (const key of Object.getOwnPropertyNames(proto)) {
        const handler = proto[key];
        if (typeof handler !== 'function') continue;
        const answer = answerOf(handler);
        if (!answer) continue;
        const method = Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod;
        const status =
          (Reflect.getMetadata(HTTP_CODE_METADATA, handler) as number | undefined) ??
          (method === RequestMethod.POST ? 201 : 200);
        const descriptor = Object.getOwnPropertyDescriptor(proto, key)!;
        const decorate = (d: MethodDecorator) => d(proto, key, descriptor);
        if ('shape' in answer) {
          for (const code of [status, answer.alsoStatus ?? status]) {
            decorate(
              ApiResponse({
                status: code,
                schema: { $ref: `#/components/schemas/${answer.shape}` },
              }),
            );
          }
        } else if ('file' in answer) {
          decorate(ApiProduces(answer.file));
          decorate(
            ApiResponse({
              status,
              content: { [answer.file]: { schema: { type: 'string', format: 'binary' } } },
            }),
          );
        } else {
          decorate(ApiResponse({ status, description: 'No content' }));
        }
      }
    }
  }
}

let described = new WeakSet<INestApplication>();

/** The OpenAPI document of the app: its routes, and their answers from the contract. */
export function buildOpenApiDocument(
  app: INestApplication,
  components: Record<string, object>,
): OpenAPIObject {
  if (!described.has(app)) {
    describeAnswers(app);
    described.add(app);
  }
  const config = new DocumentBuilder()
    .setTitle('Gaugeproof API')
    .setDescription('Receiving inspection and supplier quality for power and ground cable')
    .addBearerAuth()
    .addCookieAuth('gp_session')
    .build();
  const doc = SwaggerModule.createDocument(app, config);
  doc.components = {
    ...doc.components,
    schemas: { ...doc.components?.schemas, ...components },
  };
  return doc;
}
export function resetDescribed(): void {
  described = new WeakSet();
}
