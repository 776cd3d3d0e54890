import { Injectable } from '@nestjs/common';

/** The moments of a build where the process could die with some of the work done. */
export type BuildPoint = 'files-stored' | 'signed';

/**
 * Where a build may be made to fail. The server's own does nothing; the suites replace it to
 * throw (a failed build) or to never return (a process killed half-way).
 */
@Injectable()
export class ReleaseBuildFaults {
  async reach(_point: BuildPoint): Promise<void> {}
}
