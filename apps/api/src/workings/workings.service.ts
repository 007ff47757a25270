import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  type WorkingOutput,
  type WorkingRerunResponse,
  type WorkingView,
} from '@skyledger/contracts';
import { DataSource } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { claimRoles } from '../claims/claim-policy';
import { ClaimsService } from '../claims/claims.service';
import { ApiError } from '../common/errors/api-error';
import { versionUsing } from '../verdicts/verdict-references';
import { applyCalculation } from './apply-calculation';
import { Working } from './entities/working.entity';
import { runCalculation } from './run-calculation';
import { toWorkingView } from './working-view';

type Outputs = Record<string, WorkingOutput>;

/** The outputs whose value, unit or band differ between two runs. */
export function outputDifferences(before: Outputs, after: Outputs) {
  const names = [...new Set([...Object.keys(before), ...Object.keys(after)])];
  return names
    .filter((name) => JSON.stringify(before[name]) !== JSON.stringify(after[name]))
    .map((output) => ({ output, before: before[output] ?? null, after: after[output] ?? null }));
}

/** A claim's workings, and running one again with the library now in use. */
@Injectable()
export class WorkingsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly claims: ClaimsService,
    private readonly audit: AuditService,
  ) {}

  async list(claimId: string): Promise<WorkingView[]> {
    await this.claims.findOrFail(claimId);
    const workings = await this.dataSource.manager.find(Working, {
      where: { claimId },
      relations: { createdBy: true },
      order: { createdAt: 'ASC', id: 'ASC' },
    });
    return workings.map(toWorkingView);
  }

  /**
   * Recomputes a working from its stored inputs (series as they were read when it was
   * saved) and keeps the new result, saying which outputs changed. A working a verdict
   * version sent for sign-off uses is kept as it was (readers may have its numbers): the
   * new result is only shown, and a correction brings it in as a new working.
   */
  async rerun(
    actor: AuthenticatedUser,
    claimId: string,
    workingId: string,
    version: number,
  ): Promise<WorkingRerunResponse> {
    const outcome = await this.dataSource.transaction(async (manager) => {
      await this.claims.lockForContribution(manager, claimId, actor, claimRoles.research);
      const working = await manager.findOne(Working, {
        where: { id: workingId, claimId },
        lock: { mode: 'pessimistic_write' },
      });
      if (!working) throw new ApiError(HttpStatus.NOT_FOUND, 'No such working on this claim');
      if (working.version !== version) throw ApiError.stale('This working', working.version);
      const previousLibraryVersion = working.libraryVersion;
      const calculation = await runCalculation(null, working.calculatorId, working.inputs);
      const differences = outputDifferences(
        working.outputs as Outputs,
        calculation.result.outputs as Outputs,
      );
      const keptBy = await versionUsing(
        manager,
        claimId,
        { kind: 'working', id: workingId },
        { sent: true },
      );
      const rerun = {
        previousLibraryVersion,
        libraryVersion: calculation.result.libraryVersion,
        keptBy: keptBy?.number ?? null,
        differences,
      };
      if (keptBy) return rerun;
      applyCalculation(working, { ...calculation, datasetRefs: working.datasetRefs });
      await manager.save(working);
      await this.audit.record(manager, {
        actorId: actor.id,
        action: 'working.rerun',
        entityType: 'working',
        entityId: working.id,
        claimId,
        summary: {
          previousLibraryVersion,
          libraryVersion: working.libraryVersion,
          changedOutputs: differences.map((difference) => difference.output),
        },
      });
      return rerun;
    });
    const working = await this.dataSource.manager.findOneOrFail(Working, {
      where: { id: workingId },
      relations: { createdBy: true },
    });
    return {
      ...outcome,
      working: toWorkingView(working),
      changed: outcome.differences.length > 0,
    };
  }
}
