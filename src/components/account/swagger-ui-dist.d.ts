// The part of swagger-ui-dist's self-contained bundle that the API reference page uses.
declare module "swagger-ui-dist/swagger-ui-es-bundle.js" {
  interface SwaggerUIOptions {
    domNode: HTMLElement;
    url: string;
    docExpansion?: "list" | "full" | "none";
    defaultModelsExpandDepth?: number;
    tryItOutEnabled?: boolean;
    validatorUrl?: string | null;
    onComplete?: () => void;
  }
  const SwaggerUI: (options: SwaggerUIOptions) => unknown;
  export default SwaggerUI;
}
