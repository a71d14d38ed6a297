/** Audit actions in plain words. Unknown actions show as recorded, so nothing is hidden. */
export function describeAudit(action: string, detail: Record<string, unknown> | null): string {
  const d = detail ?? {};
  switch (action) {
    case 'scene.create':
      return typeof d.title === 'string' ? `Created the scene as “${d.title}”` : 'Created the scene';
    case 'scene.update': {
      const fields = Array.isArray(d.fields) ? d.fields.filter((f): f is string => typeof f === 'string') : [];
      const what = fields.length ? fields.map((f) => (f === 'document' ? 'sketch' : f === 'equipmentProfileId' ? 'truck' : f)).join(', ') : 'the scene';
      return `Saved revision ${d.revision ?? '?'} (${what})`;
    }
    case 'scene.delete':
      return 'Deleted the scene';
    case 'scene.restore':
      return 'Restored the deleted scene';
    case 'scene.archive':
      return 'Archived the scene';
    case 'scene.unarchive':
      return 'Took the scene out of the archive';
    case 'scene.duplicate':
      return typeof d.title === 'string' ? `Created the scene as a copy of “${d.title}”` : 'Created the scene as a copy';
    case 'scene.copied':
      return 'Made a copy of the scene';
    case 'scene.training.add':
      return 'Added it to the training set';
    case 'scene.training.remove':
      return 'Took it out of the training set';
    default:
      return action;
  }
}
