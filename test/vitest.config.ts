import { defineProject } from 'vitest/config';

export default defineProject({
  test: { name: 'integration', include: ['**/*.test.ts'], testTimeout: 120000, hookTimeout: 120000 },
});
