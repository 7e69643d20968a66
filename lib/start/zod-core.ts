// A start-up step (index.ts): runs zod's core, as the app imports it.
import 'zod/v4/core';
