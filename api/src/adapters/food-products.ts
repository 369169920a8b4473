/**
 * The open food-products database, asked through its official Node SDK
 * (`@openfoodfacts/openfoodfacts-nodejs`, API v2 product read) at the base URL the config names:
 * our local fake in development and tests (scripts/src/lib/food-products-fake.ts).
 *
 * Privacy: the lookup runs on the server only and sends the barcode and nothing else. The request
 * is built here from the barcode alone: no user id, name, e-mail, cookie or session header, no
 * account token (the SDK's `accessToken` stays unset), and the SDK's own fixed User-Agent.
 */
import { OpenFoodFacts } from '@openfoodfacts/openfoodfacts-nodejs';
import { kjToKcal, type LabelNutrients } from '@driftmark/shared';

/** How long one lookup may take before the answer is "unavailable" (common practice, no source). */
const LOOKUP_TIMEOUT_MS = 5_000;

/** A product's name and its label per 100 g, as the database gives them. */
export interface FoundProduct {
  name: string;
  per100g: LabelNutrients;
}

export type ProductLookup =
  | { kind: 'found'; product: FoundProduct }
  /** No such barcode, or a product listed without energy and macros. */
  | { kind: 'not_found'; listedWithoutFigures: boolean };

/** The database did not answer, answered 5xx, or answered something unreadable. */
export class FoodProductsUnavailable extends Error {
  constructor(message: string, options?: { cause?: unknown }) {
    super(message, options);
    this.name = 'FoodProductsUnavailable';
  }
}

const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) && v >= 0 ? v : null);

/** The label figures of a v2 product, or null when energy or a macro is missing. */
export function readProduct(product: Record<string, unknown>): FoundProduct | null {
  const n = (product.nutriments ?? {}) as Record<string, unknown>;
  const kj = num(n['energy-kj_100g']) ?? num(n['energy_100g']);
  const energyKcal = num(n['energy-kcal_100g']) ?? (kj === null ? null : kjToKcal(kj));
  const proteinG = num(n['proteins_100g']);
  const carbohydrateG = num(n['carbohydrates_100g']);
  const fatG = num(n['fat_100g']);
  if (energyKcal === null || proteinG === null || carbohydrateG === null || fatG === null) return null;
  const sodiumG = num(n['sodium_100g']);
  const brand = typeof product.brands === 'string' ? product.brands.split(',')[0]!.trim() : '';
  const rawName = typeof product.product_name === 'string' ? product.product_name.trim() : '';
  const name = (rawName || brand || 'Packaged food').slice(0, 120);
  return {
    name: name.length >= 2 ? name : `${name} (packaged)`,
    per100g: {
      energyKcal,
      proteinG,
      carbohydrateG,
      fatG,
      fibreG: num(n['fiber_100g']),
      alcoholG: num(n['alcohol_100g']),
      sodiumMg: sodiumG === null ? null : sodiumG * 1000,
    },
  };
}

/** Looks one EAN-13 up; throws FoodProductsUnavailable when the database cannot answer. */
export async function lookupProduct(baseUrl: string | undefined, barcode: string): Promise<ProductLookup> {
  if (!baseUrl) throw new FoodProductsUnavailable('FOOD_PRODUCTS_URL is not set');
  // Only the URL and the SDK's headers go out: no credentials, whatever the caller's request held.
  const fetchBarcodeOnly: typeof fetch = (input, init) =>
    fetch(input, { ...init, credentials: 'omit', signal: AbortSignal.timeout(LOOKUP_TIMEOUT_MS) });
  const client = new OpenFoodFacts(fetchBarcodeOnly, { host: baseUrl });
  let answer: Awaited<ReturnType<typeof client.getProductV2>>;
  try {
    answer = await client.getProductV2(barcode);
  } catch (error) {
    throw new FoodProductsUnavailable('no answer from the food-products database', { cause: error });
  }
  const status = answer.response.status;
  if (status === 404) return { kind: 'not_found', listedWithoutFigures: false };
  if (status !== 200 || !answer.data) {
    throw new FoodProductsUnavailable(`the food-products database answered ${status}`);
  }
  const data = answer.data as { status?: number; product?: Record<string, unknown> };
  if (data.status !== 1 || !data.product) return { kind: 'not_found', listedWithoutFigures: false };
  const product = readProduct(data.product);
  return product ? { kind: 'found', product } : { kind: 'not_found', listedWithoutFigures: true };
}
