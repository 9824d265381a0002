"use client";

import dynamic from "next/dynamic";

/**
 * The staff-only e-mail form as its own chunk. The dynamic import sits in a client module because a
 * server page's bundle takes in every client component its modules name, rendered or not: this way
 * the form and its checks reach only the staff for whom the panel is rendered.
 */
export const LazyEmailCardForm = dynamic(() => import("./email-card-form").then((module) => module.EmailCardForm));
