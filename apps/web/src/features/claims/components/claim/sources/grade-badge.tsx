import { Badge } from '@radix-ui/themes';
import { reliabilityGradeLabels, type ReliabilityGrade } from '@skyledger/contracts';

// The colour repeats the word, which is always there.
const gradeColors = {
  strong: 'jade',
  adequate: 'blue',
  weak: 'amber',
  unreliable: 'red',
} as const satisfies Record<ReliabilityGrade, string>;

export function GradeBadge({ grade }: { grade: ReliabilityGrade }) {
  return (
    <Badge color={gradeColors[grade]} variant="soft" highContrast>
      Grade: {reliabilityGradeLabels[grade]}
    </Badge>
  );
}
