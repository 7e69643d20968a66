// A start-up step (index.ts): runs zod's modules, as the app imports them.
import 'zod';
