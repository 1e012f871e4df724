import type { DataSource } from 'typeorm'
import type { AppConfig } from './config/env'
import type { RuleBook } from './reasoning/rule-book'
import { BuildCompletionService } from './builds/build-completion.service'
import { BuildEvaluationService } from './builds/build-evaluation.service'
import { BuildFillService } from './builds/build-fill.service'
import { BuildSheetService } from './builds/build-sheet.service'
import { ExportService } from './imports/export.service'
import { FitGraphIndex } from './fitment/fit-graph'
import { FitmentService } from './fitment/fitment.service'
import { InferredFits } from './fitment/inferred-fits'
import { GraphService } from './fitment/graph.service'
import { LinkService } from './fitment/link.service'
import { ImportService } from './imports/import.service'
import { ModificationService } from './catalogue/modification.service'
import { PartService } from './catalogue/part.service'
import { UserService } from './users/user.service'

/** Every service, built once per app around one data source and one rule book. */
export function createServices(dataSource: DataSource, config: AppConfig, rules: RuleBook) {
  const parts = new PartService(dataSource)
  const graphIndex = new FitGraphIndex(dataSource)
  const modifications = new ModificationService(dataSource)
  const evaluation = new BuildEvaluationService(dataSource, parts, graphIndex, rules, modifications)
  const completion = new BuildCompletionService(dataSource, parts, graphIndex, evaluation, modifications)
  return {
    rules,
    users: new UserService(dataSource),
    parts,
    graphIndex,
    modifications,
    fitment: new FitmentService(parts, graphIndex, new InferredFits(dataSource, rules), modifications),
    graph: new GraphService(parts, graphIndex),
    evaluation,
    completion,
    fill: new BuildFillService(graphIndex, evaluation, completion),
    sheets: new BuildSheetService(dataSource, parts, evaluation),
    links: new LinkService(dataSource, parts, graphIndex),
    imports: new ImportService(dataSource, { maxRows: config.importMaxRows }, graphIndex),
    exports: new ExportService(dataSource),
  }
}
export type Services = ReturnType<typeof createServices>
