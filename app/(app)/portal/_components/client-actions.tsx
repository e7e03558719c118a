import Link from "next/link";
import { buttonStyles } from "@/components/ui/button-styles";

/** What a client can do on a project: write to the team, log a test, report a problem, save the dates. */
export function ClientActions({ projectId, stage }: { projectId: string; stage: string }) {
  return (
    <div className="flex flex-wrap gap-2">
      <Link href={`/projects/${projectId}/talk#new-message`} className={buttonStyles.primary}>
        Send a message
      </Link>
      {stage === "cycling" && (
        <Link href={`/projects/${projectId}/water`} className={buttonStyles.secondary}>
          Log a water test
        </Link>
      )}
      <Link href={`/projects/${projectId}#problem-photo`} className={buttonStyles.secondary}>
        Report a problem with a photo
      </Link>
      <a href={`/api/projects/${projectId}/calendar.ics`} className={buttonStyles.secondary} download>
        Add to calendar
      </a>
    </div>
  );
}
