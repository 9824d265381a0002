import { domAnimation } from "framer-motion";

// Loaded after the page, so the animation engine is not part of the first-load JavaScript.
export default domAnimation;
