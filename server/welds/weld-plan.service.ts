import type { WeldMetal } from '../../shared/welds/weld-metals';
import { weldPlan, type WeldPlan } from '../../shared/welds/weld-plan';
import { weldSites, type MetalRef, type WeldRunInput } from '../../shared/welds/weld-sites';
import type { RunView } from '../../shared/schemas/jobs';
import type { CatalogueService } from '../catalogue/catalogue.service';
import type { FlexPartsService } from '../flex-parts/flex-parts.service';
import { AppError } from '../http/app-error';
import type { JobsService } from '../jobs/jobs.service';
import type { WeldRulesService } from './weld-rules.service';

const runLength = (run: RunView) => run.segments.reduce((sum, s) => sum + s.lengthMm, 0);

/** The job's welds: sites from its runs, metals from the catalogue and flex parts, fillers from the shop's table. */
export class WeldPlanService {
  constructor(
    private readonly jobs: JobsService,
    private readonly catalogue: CatalogueService,
    private readonly flexParts: FlexPartsService,
    private readonly rules: WeldRulesService,
  ) {}

  /** The alloy's last published designation, UNS and family; retired alloys keep theirs. */
  private async metal(alloyId: string): Promise<WeldMetal | { missing: string }> {
    try {
      const p = (await this.catalogue.detail(alloyId, null)).published;
      if (p) return { uns: p.uns, designation: p.designation, family: p.family };
    } catch (err) {
      if (!(err instanceof AppError && err.status === 404)) throw err;
    }
    return { missing: 'The alloy is not in the catalogue' };
  }

  /** A cuff known by UNS alone takes the catalogue's name and family where the catalogue has that UNS. */
  private async metalByUns(uns: string): Promise<WeldMetal> {
    const id = await this.catalogue.alloyIdByUns(uns);
    const found = id ? await this.metal(id) : null;
    return found && 'uns' in found ? found : { uns, designation: `UNS ${uns}`, family: null };
  }

  async plan(jobId: string): Promise<WeldPlan> {
    const [job, parts, rules] = await Promise.all([this.jobs.detail(jobId), this.flexParts.list(true), this.rules.list()]);
    const cuffs = new Map(parts.map((p) => [p.id, p.cuffUns]));
    const inputs: WeldRunInput[] = job.runs.map((run) => {
      const partId = run.result?.flex?.chosen?.part.id;
      return {
        id: run.id,
        name: run.name,
        alloyId: run.alloyId,
        tube: run.tube,
        lengthMm: runLength(run),
        startFixing: run.startFixing,
        endFixing: run.endFixing,
        startFlangeAlloyId: run.startFlangeAlloyId,
        endFlangeAlloyId: run.endFlangeAlloyId,
        joint: run.joint,
        flexCuffUns: partId === undefined ? undefined : (cuffs.get(partId) ?? null),
      };
    });
    const sites = weldSites(inputs);
    const refs = sites.flatMap((s) => s.metals);
    const alloyIds = [...new Set(refs.flatMap((m) => ('alloyId' in m ? [m.alloyId] : [])))];
    const metals = new Map(await Promise.all(alloyIds.map(async (id) => [id, await this.metal(id)] as const)));
    const cuffUns = [...new Set(refs.flatMap((m) => ('uns' in m ? [m.uns] : [])))];
    const byUns = new Map(await Promise.all(cuffUns.map(async (uns) => [uns, await this.metalByUns(uns)] as const)));
    const lookup = (ref: MetalRef): WeldMetal | { missing: string } => {
      if ('missing' in ref) return ref;
      return 'alloyId' in ref ? metals.get(ref.alloyId)! : byUns.get(ref.uns)!;
    };
    return weldPlan(job.id, job.runs, sites, lookup, rules);
  }
}
