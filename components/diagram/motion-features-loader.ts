/** The animation engine, loaded after the page so it is not part of the first-load JavaScript. */
export const loadMotionFeatures = () => import("./motion-features").then((features) => features.default);
