"use client";

import { type ComponentProps, type ComponentType, Fragment, type ReactNode, useEffect, useSyncExternalStore } from "react";

/** Where a drawn shape is heading: attributes, with `attrX`/`attrY` for an element's x and y. */
export type DrawnAttributes = Record<string, number | string>;

type Shape<Tag extends "svg" | "circle" | "rect" | "line" | "text"> = ComponentType<Omit<ComponentProps<Tag>, "ref"> & { animate: DrawnAttributes }>;

/** The elements a drawing is made of: still ones until the animation engine is needed, then animated ones. */
export interface DrawingKit {
  Frame: ComponentType<{ children: ReactNode }>;
  svg: Shape<"svg">;
  circle: Shape<"circle">;
  rect: Shape<"rect">;
  line: Shape<"line">;
  text: Shape<"text">;
}

const attributesOf = ({ attrX, attrY, ...rest }: DrawnAttributes) => ({ ...rest, ...(attrX === undefined ? {} : { x: attrX }), ...(attrY === undefined ? {} : { y: attrY }) });

function still<Tag extends "svg" | "circle" | "rect" | "line" | "text">(Tag: Tag): Shape<Tag> {
  const Still = ({ animate, ...props }: Omit<ComponentProps<Tag>, "ref"> & { animate: DrawnAttributes }) => {
    const Element = Tag as unknown as ComponentType<Record<string, unknown>>;
    return <Element {...props} {...attributesOf(animate)} />;
  };
  Still.displayName = `Still.${Tag}`;
  return Still as Shape<Tag>;
}

const stillKit: DrawingKit = { Frame: Fragment, svg: still("svg"), circle: still("circle"), rect: still("rect"), line: still("line"), text: still("text") };

let motionKit: DrawingKit | null = null;
let loading: Promise<void> | null = null;
const listeners = new Set<() => void>();

/** Fetches the animation engine once per page; drawings switch to it when it arrives. */
export function loadMotion(): Promise<void> {
  loading ??= import("./motion-kit")
    .then((module) => {
      motionKit = module.motionKit;
      for (const listener of listeners) listener();
    })
    .catch(() => {
      // Offline or a stale build: the drawings stay still, and the next input tries again.
      loading = null;
    });
  return loading;
}

const subscribe = (listener: () => void) => {
  listeners.add(listener);
  return () => listeners.delete(listener);
};

/** The elements to draw with now: still on the server and until the engine has loaded. */
export function useDrawingKit(): DrawingKit {
  return useSyncExternalStore(subscribe, () => motionKit, () => null) ?? stillKit;
}

const FIRST_INPUTS = ["pointerdown", "keydown"] as const;

/**
 * A drawing changes only after a person does something (types, taps, picks), so the engine is
 * fetched at the first key or pointer press on the page rather than with the page.
 */
export function useMotionOnFirstInput(): void {
  const kit = useDrawingKit();
  useEffect(() => {
    if (kit !== stillKit) return;
    const start = () => void loadMotion();
    for (const type of FIRST_INPUTS) window.addEventListener(type, start, { capture: true, passive: true, once: true });
    return () => {
      for (const type of FIRST_INPUTS) window.removeEventListener(type, start, { capture: true });
    };
  }, [kit]);
}
