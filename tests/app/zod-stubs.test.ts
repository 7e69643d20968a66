import { z } from 'zod';
import { SignInSchema } from '@/shared/schemas/auth';

// The app project maps zod's JSON Schema and compiler modules to the web bundle's stand-in (jest.config.js):
// validation must still work, and conversion must fail loudly rather than silently.
describe('zod without its JSON Schema conversion and compiler', () => {
  it('still parses and reports field messages when the JSON Schema modules are stubbed', () => {
    expect(SignInSchema.safeParse({ email: ' A@B.example ', password: 'x' })).toEqual({ success: true, data: { email: 'a@b.example', password: 'x' } });
    const refused = SignInSchema.safeParse({ email: 'nope', password: '' });
    expect(refused.success).toBe(false);
    expect(refused.error?.issues.map((issue) => issue.message)).toEqual(['Enter a valid e-mail address.', 'Enter your password.']);
  });

  it('throws a named error when asked to convert a schema, proving the stand-in is the one loaded', () => {
    expect(() => z.toJSONSchema(SignInSchema)).toThrow('zod JSON Schema conversion is not part of the web bundle');
    expect(() => z.compile(SignInSchema)).toThrow('zod compile() is not part of the web bundle');
  });
});
