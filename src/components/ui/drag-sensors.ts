import type { PointerEvent } from 'react';
import { KeyboardSensor, PointerSensor, TouchSensor, useSensor, useSensors, type PointerSensorOptions } from '@dnd-kit/core';
import { sortableKeyboardCoordinates } from '@dnd-kit/sortable';

/**
 * The pointer sensor for mouse and pen only. A finger would otherwise be captured by it (pointer
 * events come before touch events), and it needs `touch-action: none`, which stops a swipe that
 * starts on a handle from scrolling the page.
 */
class MouseAndPenSensor extends PointerSensor {
  static activators = [
    {
      eventName: 'onPointerDown' as const,
      handler: (event: PointerEvent, options: PointerSensorOptions) =>
        event.nativeEvent.pointerType !== 'touch' && PointerSensor.activators[0].handler(event, options),
    },
  ];
}

/**
 * Sensors for a sortable list on a tablet: a mouse or pen drags after a few pixels; a finger
 * after a short press, so that a swipe over the handles still scrolls; the keyboard with Space,
 * the arrow keys and Space (Escape cancels).
 */
export function useDragSensors() {
  return useSensors(
    useSensor(MouseAndPenSensor, { activationConstraint: { distance: 5 } }),
    useSensor(TouchSensor, { activationConstraint: { delay: 180, tolerance: 8 } }),
    useSensor(KeyboardSensor, { coordinateGetter: sortableKeyboardCoordinates }),
  );
}
