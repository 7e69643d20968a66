// A start-up step (index.ts): runs the form library's modules, as the app imports them.
import 'react-hook-form';
import '@hookform/resolvers/zod';
