/**
 * Runs the food-products fake (lib/food-products-fake.ts) as its own process, configured from the
 * environment: FOOD_PRODUCTS_PORT (default 4580), FOOD_PRODUCTS_HOST (default 127.0.0.1).
 * start/dev/test launch it with an IPC channel and wait for its { type: 'ready', port } message.
 */
import { startFoodProductsFake } from './lib/food-products-fake.js';

const port = Number(process.env.FOOD_PRODUCTS_PORT ?? 4580);
const host = process.env.FOOD_PRODUCTS_HOST ?? '127.0.0.1';

if (!Number.isInteger(port) || port < 0 || port > 65_535) {
  console.error(
    `[food-products-fake] FOOD_PRODUCTS_PORT must be a port number (got "${process.env.FOOD_PRODUCTS_PORT}").`,
  );
  process.exit(2);
}

try {
  const fake = await startFoodProductsFake({ port, host });
  console.log(`[food-products-fake] Listening on ${fake.url}`);
  process.send?.({ type: 'ready', port: fake.port });
  // Without this the open IPC channel would keep a parent-less fake alive forever.
  process.on('disconnect', () => void fake.close().then(() => process.exit(0)));
  let closing = false;
  for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP'] as const) {
    process.on(signal, () => {
      if (closing) return;
      closing = true;
      void fake.close().then(() => process.exit(0));
    });
  }
} catch (error) {
  console.error(`[food-products-fake] Could not listen on ${host}:${port}: ${(error as Error).message}`);
  process.exit(1);
}
