import { barcodeProblem } from '@driftmark/shared';
import { lazy, Suspense, useState, type FormEvent } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Skeleton } from '@/components/ui/spinner';
import { isApiError } from '@/lib/api-client';
import type { LinkedKeys } from '../api/keys';
import { useLookupBarcode } from '../api/lookup-barcode';
import { LabelCheckNote } from './label-check-note';
import { LabelFoodForm } from './label-food-form';

// The barcode reader (ZXing) is its own chunk, fetched when the athlete asks for the camera or a photo.
const BarcodeScanner = lazy(() => import('./barcode-scanner').then((m) => ({ default: m.BarcodeScanner })));

interface PackagedFoodPanelProps {
  athleteId: string;
  linkedKeys?: LinkedKeys;
}

/**
 * A packaged food for the athlete's own list: scan its barcode (camera or photo), or type the
 * number; the server looks it up. Not found, or the lookup down: copy the label instead.
 */
export function PackagedFoodPanel({ athleteId, linkedKeys }: PackagedFoodPanelProps) {
  const lookup = useLookupBarcode(athleteId, { linkedKeys });
  const [scanning, setScanning] = useState(false);
  const [typed, setTyped] = useState('');
  const [typedProblem, setTypedProblem] = useState<string | null>(null);
  const [photoProblem, setPhotoProblem] = useState<string | null>(null);
  const [showLabel, setShowLabel] = useState(false);

  const find = (code: string) => {
    setScanning(false);
    setTyped(code);
    setTypedProblem(null);
    setShowLabel(false);
    lookup.mutate(code, {
      onError: (error) => {
        if (isApiError(error) && error.fields.barcode && error.code === 'validation_failed') {
          setTypedProblem(error.fields.barcode);
        } else setShowLabel(true);
      },
    });
  };

  const submitTyped = (event: FormEvent) => {
    event.preventDefault();
    const code = typed.replace(/\s+/g, '');
    const problem = barcodeProblem(code);
    if (problem) return setTypedProblem(problem);
    find(code);
  };

  const readPhoto = async (file: File | undefined) => {
    if (!file) return;
    setPhotoProblem(null);
    const { readBarcodePhoto } = await import('./barcode-scanner');
    const code = await readBarcodePhoto(file);
    if (code) find(code);
    else
      setPhotoProblem(
        'No barcode could be read in that photo. Try again closer and flatter, or type the number.',
      );
  };

  const error = lookup.error;
  return (
    <div className="space-y-5">
      <Card className="space-y-4">
        <h2 className="text-lg font-semibold text-ink">Scan a barcode</h2>
        <div className="flex flex-wrap gap-2">
          <Button variant={scanning ? 'secondary' : 'primary'} onClick={() => setScanning((s) => !s)}>
            {scanning ? 'Stop the camera' : 'Scan with the camera'}
          </Button>
          <label className="inline-flex min-h-touch cursor-pointer items-center rounded-md border border-line-strong bg-surface px-4 text-base text-ink shadow-card hover:bg-sunken">
            Photo of the barcode
            <input
              type="file"
              accept="image/*"
              className="sr-only"
              onChange={(e) => {
                void readPhoto(e.target.files?.[0]);
                e.target.value = '';
              }}
            />
          </label>
        </div>
        {photoProblem ? <Alert tone="caution">{photoProblem}</Alert> : null}
        {scanning ? (
          <Suspense fallback={<Skeleton className="aspect-[4/3] w-full" />}>
            <BarcodeScanner
              onCode={find}
              onProblem={(message) => {
                setScanning(false);
                setPhotoProblem(message);
              }}
            />
          </Suspense>
        ) : null}
        <form
          noValidate
          onSubmit={submitTyped}
          className="flex flex-wrap items-end gap-2"
          aria-label="Type the barcode"
        >
          <div className="min-w-0 flex-1">
            <label htmlFor="barcode-number" className="mb-1 block text-sm font-semibold text-ink">
              Or type the number under the barcode
            </label>
            <input
              id="barcode-number"
              name="barcode"
              inputMode="numeric"
              autoComplete="off"
              value={typed}
              onChange={(e) => setTyped(e.target.value)}
              aria-invalid={typedProblem ? true : undefined}
              aria-describedby={typedProblem ? 'barcode-number-error' : undefined}
              className="min-h-touch w-full rounded-md border border-line-strong bg-surface px-3 text-base tabular-nums"
            />
          </div>
          <Button type="submit" variant="secondary" loading={lookup.isPending}>
            Look up
          </Button>
          {typedProblem ? (
            <p id="barcode-number-error" className="w-full text-sm text-off-plan" role="alert">
              {typedProblem}
            </p>
          ) : null}
        </form>
        {lookup.isPending ? <p className="text-sm text-ink-muted">Looking the product up…</p> : null}
        {lookup.data ? (
          <LabelCheckNote
            result={lookup.data}
            title={lookup.data.created ? 'Added to your foods' : 'Already in your foods'}
          />
        ) : null}
        {error && isApiError(error) && error.code !== 'validation_failed' ? (
          <Alert tone={error.code === 'barcode_not_found' ? 'info' : 'caution'} live>
            {error.message}
          </Alert>
        ) : null}
      </Card>
      <Card className="space-y-4">
        <h2 className="text-lg font-semibold text-ink">From the label</h2>
        {showLabel ? (
          <p className="text-sm text-ink-muted">Copy the figures from the packet’s nutrition label.</p>
        ) : null}
        <LabelFoodForm owner={{ kind: 'personal', athleteId }} linkedKeys={linkedKeys} />
      </Card>
    </div>
  );
}
