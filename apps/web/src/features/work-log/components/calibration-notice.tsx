import { WRENCH_CALIBRATION_NOTICE } from '@benchproof/domain';
import { Alert } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';

/**
 * Shown when the wrench's last calibration was more than 12 months before the
 * work (libs/domain isWrenchCalibrationOverdue; ISO 6789-1:2017 interval, from memory).
 */
export function CalibrationNotice({ overdue }: { overdue: boolean }) {
  if (!overdue) return null;
  return (
    <Alert color="orange" variant="light" icon={<IconAlertTriangle />} title={WRENCH_CALIBRATION_NOTICE} p="xs">
      Have the wrench checked before relying on its readings.
    </Alert>
  );
}
