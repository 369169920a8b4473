/**
 * A local stand-in for the open food-products database: answers GET /api/v2/product/:code the way
 * its API v2 does (`status` 1 with `product`, or HTTP 404 with `status` 0), for a few INVENTED
 * products of the Driftmark demo. Barcodes are in the GS1 200–299 range (restricted circulation:
 * in-store numbers no real brand carries). Loopback, no state beyond the request log the tests read.
 */
import http from 'node:http';
import type { AddressInfo } from 'node:net';

/** One invented product: name, brand, serving as printed and the per-100 g figures of its label. */
interface FakeProduct {
  code: string;
  product_name: string;
  brands: string;
  serving_size?: string;
  nutriments: Record<string, number>;
}

/**
 * The demo's invented products. Energy per 100 g in kcal and kJ, macros in g, sodium in g as the
 * database gives it.
 */
export const FAKE_PRODUCTS: readonly FakeProduct[] = [
  {
    code: '2004821000018',
    product_name: 'Harbourline oat clusters',
    brands: 'Harbourline',
    serving_size: '40 g',
    nutriments: {
      'energy-kcal_100g': 390,
      'energy-kj_100g': 1632,
      proteins_100g: 13,
      carbohydrates_100g: 60,
      fat_100g: 7,
      fiber_100g: 10,
      sodium_100g: 0.4,
    },
  },
  {
    code: '2004821000025',
    product_name: 'Harbourline whey shake, vanilla',
    brands: 'Harbourline',
    serving_size: '30 g',
    nutriments: {
      'energy-kcal_100g': 377,
      'energy-kj_100g': 1577,
      proteins_100g: 75,
      carbohydrates_100g: 8,
      fat_100g: 5,
      sodium_100g: 0.25,
    },
  },
  {
    // Its printed energy is far above what its macros give: the label check warns.
    code: '2004821000032',
    product_name: 'Kestrel Hill protein bar, salted caramel',
    brands: 'Kestrel Hill',
    serving_size: '60 g',
    nutriments: {
      'energy-kcal_100g': 450,
      'energy-kj_100g': 1883,
      proteins_100g: 30,
      carbohydrates_100g: 35,
      fat_100g: 12,
      sodium_100g: 0.3,
    },
  },
  {
    // Listed without nutrition figures: found, but there is nothing to copy.
    code: '2004821000049',
    product_name: 'Kestrel Hill sparkling water',
    brands: 'Kestrel Hill',
    nutriments: {},
  },
];

export interface FoodProductsFakeOptions {
  /** 0 picks a free port; the returned `port` is the real one. */
  port: number;
  host?: string;
}

/** What one request to the fake carried (the tests check nothing about the athlete left the server). */
export interface FakeRequest {
  method: string;
  url: string;
  headers: http.IncomingHttpHeaders;
}

export interface FoodProductsFake {
  port: number;
  host: string;
  url: string;
  /** Every request received, oldest first. */
  requests: FakeRequest[];
  close(): Promise<void>;
}

const PRODUCT_PATH = /^\/api\/v2\/product\/([^/?]+)(?:\?.*)?$/;

export async function startFoodProductsFake(options: FoodProductsFakeOptions): Promise<FoodProductsFake> {
  const host = options.host ?? '127.0.0.1';
  const requests: FakeRequest[] = [];
  const server = http.createServer((req, res) => {
    requests.push({ method: req.method ?? '', url: req.url ?? '', headers: req.headers });
    const send = (status: number, body: unknown) => {
      res.writeHead(status, { 'Content-Type': 'application/json' });
      res.end(JSON.stringify(body));
    };
    const match = req.method === 'GET' ? PRODUCT_PATH.exec(req.url ?? '') : null;
    if (!match) return send(404, { status: 0, status_verbose: 'no such endpoint' });
    const code = decodeURIComponent(match[1]!);
    const product = FAKE_PRODUCTS.find((p) => p.code === code);
    if (!product) return send(404, { code, status: 0, status_verbose: 'product not found' });
    return send(200, { code, status: 1, status_verbose: 'product found', product });
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port, host, () => resolve());
  });
  const port = (server.address() as AddressInfo).port;
  return {
    port,
    host,
    url: `http://${host}:${port}`,
    requests,
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}
