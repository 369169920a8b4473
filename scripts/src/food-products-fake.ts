/**
 * Runs the food-products fake (lib/food-products-fake.ts) as its own process, configured from the
 * environment: FOOD_PRODUCTS_PORT (default 4580), FOOD_PRODUCTS_HOST (default 127.0.0.1).
 * start/dev/test launch it with an IPC channel and wait for its { type: 'ready', port } message.
 */
import { runFakeProcess } from './lib/fake-process.js';
import { startFoodProductsFake } from './lib/food-products-fake.js';

await runFakeProcess({
  name: 'food-products-fake',
  portEnv: 'FOOD_PRODUCTS_PORT',
  defaultPort: 4580,
  hostEnv: 'FOOD_PRODUCTS_HOST',
  start: (port, host) => startFoodProductsFake({ port, host }),
  listening: (fake) => `Listening on ${fake.url}`,
});
