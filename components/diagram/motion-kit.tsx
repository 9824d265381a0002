import { domAnimation, LazyMotion, m, MotionConfig } from "framer-motion";
import type { ComponentProps, ReactNode } from "react";
import type { DrawingKit } from "./drawing-kit";

const transition = { type: "spring", stiffness: 140, damping: 22 } as const;

function Frame({ children }: { children: ReactNode }) {
  return (
    <LazyMotion features={domAnimation} strict>
      <MotionConfig reducedMotion="user" transition={transition}>
        {children}
      </MotionConfig>
    </LazyMotion>
  );
}

// Each shape starts where it is drawn (no entrance animation) and glides to its next place.
/** The animated elements, loaded by `loadMotion` when a drawing is about to change. */
export const motionKit: DrawingKit = {
  Frame,
  svg: (props) => <m.svg initial={false} {...(props as ComponentProps<typeof m.svg>)} />,
  circle: (props) => <m.circle initial={false} {...(props as ComponentProps<typeof m.circle>)} />,
  rect: (props) => <m.rect initial={false} {...(props as ComponentProps<typeof m.rect>)} />,
  line: (props) => <m.line initial={false} {...(props as ComponentProps<typeof m.line>)} />,
  text: (props) => <m.text initial={false} {...(props as ComponentProps<typeof m.text>)} />,
};
