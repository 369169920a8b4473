import type { MarkMetric } from '@driftmark/shared';
import type { MouseHandlerDataParam } from 'recharts';
import { useCallback, useEffect, useRef, useState } from 'react';
import { clampPin, type PinRequest } from '../utils/chart-data';

interface PinDragOptions {
  metric: MarkMetric;
  /** The days a pin may cover (the range's data, not the padding towards the event). */
  from: string;
  to: string;
  onPin?: (pin: PinRequest) => void;
}

function labelOf(state: MouseHandlerDataParam | undefined): string | null {
  const label = state?.activeLabel;
  return typeof label === 'string' && label !== '' ? label : null;
}

/**
 * Click a day or drag across days on a chart to pin a mark. The chart reports the day under the
 * pointer (`activeLabel`, the category of the date axis); a press starts the selection, moves
 * stretch it, the release (on the chart or anywhere else on the page) hands it to `onPin`.
 */
export function usePinDrag({ metric, from, to, onPin }: PinDragOptions) {
  const [selection, setSelection] = useState<{ start: string; end: string } | null>(null);
  const live = useRef<{ start: string; end: string } | null>(null);
  const pinRef = useRef(onPin);
  useEffect(() => {
    pinRef.current = onPin;
  }, [onPin]);

  const finish = useCallback(
    (last: string | null) => {
      const current = live.current;
      live.current = null;
      setSelection(null);
      if (!current || !pinRef.current) return;
      const pin = clampPin(current.start, last ?? current.end, from, to);
      if (pin) pinRef.current({ metric, ...pin });
    },
    [metric, from, to],
  );

  useEffect(() => {
    if (!selection) return;
    const up = () => finish(null);
    document.addEventListener('mouseup', up);
    return () => document.removeEventListener('mouseup', up);
  }, [selection, finish]);

  if (!onPin) return { selection: null, handlers: {} } as const;

  return {
    selection,
    handlers: {
      onMouseDown: (state: MouseHandlerDataParam) => {
        const label = labelOf(state);
        if (!label) return;
        live.current = { start: label, end: label };
        setSelection(live.current);
      },
      onMouseMove: (state: MouseHandlerDataParam) => {
        const label = labelOf(state);
        if (!live.current || !label || label === live.current.end) return;
        live.current = { ...live.current, end: label };
        setSelection(live.current);
      },
      onMouseUp: (state: MouseHandlerDataParam) => finish(labelOf(state)),
    },
  } as const;
}
