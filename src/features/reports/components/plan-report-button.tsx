// The season plan as a PDF to print or file: cover, map, the figures of every field with their
// sources, the planned work, totals, the months and the cautions. A landowner's copy holds their
// own fields as the plan was last approved. Place it wherever a season's plan is shown.
import { DownloadButton } from './download-button';

export function PlanReportButton({ planId, season }: { planId: number; season: string }) {
  return <DownloadButton url={`/api/plans/${planId}/report.pdf`} label={`Season plan ${season} as PDF`} making="the report" testId="plan-report-button" />;
}
