import { closestCorners, pointerWithin, type CollisionDetection, type KeyboardCoordinateGetter } from "@dnd-kit/core";
import { sortableKeyboardCoordinates } from "@dnd-kit/sortable";

/**
 * Where a dragged card is over. A stage in the phone's switcher counts only when the finger or pointer
 * is on it; otherwise the nearest card or column, among those on screen (a hidden column, or the
 * switcher on a desktop, has no size and must never win).
 */
export const boardCollisions: CollisionDetection = (args) => {
  const shown = args.droppableContainers.filter((c) => {
    const r = args.droppableRects.get(c.id);
    return r !== undefined && r.width > 0 && r.height > 0;
  });
  const isSwitch = (id: unknown) => String(id).startsWith("switch:");
  const onSwitch = pointerWithin({ ...args, droppableContainers: shown.filter((c) => isSwitch(c.id)) });
  if (onSwitch.length) return onSwitch;
  return closestCorners({ ...args, droppableContainers: shown.filter((c) => !isSwitch(c.id)) });
};

/**
 * The keyboard's arrow moves, over the droppables on screen only: a hidden column or the desktop's
 * hidden switcher sits at 0,0 with no size and would otherwise catch an arrow to the left.
 */
export const boardKeyboardCoordinates: KeyboardCoordinateGetter = (event, args) => {
  const rects = new Map([...args.context.droppableRects].filter(([, r]) => r.width > 0 && r.height > 0));
  return sortableKeyboardCoordinates(event, { ...args, context: { ...args.context, droppableRects: rects } });
};
