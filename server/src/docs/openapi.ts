import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, type OpenAPIObject, SwaggerModule } from '@nestjs/swagger';
import { cleanupOpenApiDoc } from 'nestjs-zod';
import { serverVersion } from '../common/server-version';

/** Swagger UI path (its assets come from the local swagger-ui-dist package, no CDN). */
export const docsPath = 'api/docs';
/** The OpenAPI document as JSON. */
export const docsJsonPath = 'api/docs-json';

/** Builds the OpenAPI document from the controllers and their zod DTOs. */
export function createOpenApiDocument(app: INestApplication, cookieName: string): OpenAPIObject {
  const config = new DocumentBuilder()
    .setTitle('Gramwatt API')
    .setDescription(
      'Plan the lightest solar and battery kit for a multi-day trip. Errors always have the shape ' +
        '{ statusCode, message, errors: [{ path, message }] }.',
    )
    .setVersion(serverVersion)
    .addCookieAuth(cookieName)
    .addBearerAuth()
    .build();
  return cleanupOpenApiDoc(SwaggerModule.createDocument(app, config));
}

/** Mounts Swagger UI at /api/docs and the JSON at /api/docs-json. Call before `app.init()`. */
export function setUpOpenApi(app: INestApplication, cookieName: string): void {
  const document = createOpenApiDocument(app, cookieName);
  SwaggerModule.setup(docsPath, app, document, {
    jsonDocumentUrl: docsJsonPath,
    yamlDocumentUrl: 'api/docs-yaml',
    customSiteTitle: 'Gramwatt API',
    swaggerOptions: { persistAuthorization: false },
  });
}
