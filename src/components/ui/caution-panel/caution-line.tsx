import { TriangleAlert } from "lucide-react";
import { Link } from "react-router-dom";
import { cautions, type CautionTopic } from "@shared/content/cautions.ts";

/**
 * One caution in one line, where the hazard is met (a hot pipe, gauges going on, a roof): its
 * title and first point, with the whole caution one tap away on the Safety page.
 */
export function CautionLine({ topic, point = 0 }: { topic: CautionTopic; point?: number }) {
  const caution = cautions[topic];
  return (
    <p className="flex items-start gap-2 text-sm" data-testid={`caution-line-${topic}`}>
      <TriangleAlert aria-hidden className="mt-0.5 size-4 shrink-0 text-caution" />
      <span>
        <span className="font-semibold text-caution">{caution.title}:</span>{" "}
        {caution.points[point] ?? caution.points[0]}{" "}
        <Link to={`/safety#${topic}`} className="underline">
          More
        </Link>
      </span>
    </p>
  );
}
