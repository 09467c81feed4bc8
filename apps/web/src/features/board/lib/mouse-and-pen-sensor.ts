import type { PointerEvent } from 'react';
import { PointerSensor, type PointerSensorOptions } from '@dnd-kit/core';

/**
 * The pointer sensor for mouse and pen only. A touch is left to the touch sensor and its long
 * press: the pointer sensor would otherwise claim every touch first, and a finger sliding across
 * the board would either scroll it or drag a card, never reliably the one meant.
 */
export class MouseAndPenSensor extends PointerSensor {
  static override activators = [
    {
      eventName: 'onPointerDown' as const,
      handler: (event: PointerEvent, options: PointerSensorOptions) =>
        event.nativeEvent.pointerType !== 'touch' && PointerSensor.activators[0]!.handler(event, options),
    },
  ];
}
