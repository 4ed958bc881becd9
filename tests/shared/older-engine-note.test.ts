import { describe, expect, it } from 'vitest';
import { olderEngineNote } from '../../shared/sweep/older-engine-note.ts';

describe('olderEngineNote', () => {
  it('speaks up for a sweep of an earlier minor or major version only', () => {
    expect(olderEngineNote('1.0.3', '1.1.0')).toMatch(/^Computed with engine 1\.0\.3; this is engine 1\.1\.0\. Its scan loss and EIRP follow the earlier/);
    expect(olderEngineNote('0.9.0', '1.1.0')).not.toBeNull();
    expect(olderEngineNote('1.1.0', '1.1.0')).toBeNull();
    expect(olderEngineNote('1.1.7', '1.1.0')).toBeNull(); // a patch changes no definition
    expect(olderEngineNote('1.2.0', '1.1.0')).toBeNull(); // newer than this server: nothing to say here
    expect(olderEngineNote('unknown', '1.1.0')).toBeNull();
    expect(olderEngineNote(undefined, '1.1.0')).toBeNull(); // a list row without the version
  });
});
