// A start-up step (index.ts): runs TanStack Query's modules, as the app imports them.
import '@tanstack/react-query';
