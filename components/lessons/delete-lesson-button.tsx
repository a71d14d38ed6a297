'use client';
import { useRouter } from 'next/navigation';

export function DeleteLessonButton({ id }: { id: number }) {
  const router = useRouter();
  return (
    <button
      type="button"
      className="min-h-touch justify-self-start rounded-plate border-2 border-over bg-paper-raised px-4 font-semibold text-over"
      onClick={async () => {
        if (!window.confirm('Delete this lesson? The scenes stay as they are.')) return;
        const res = await fetch(`/api/lessons/${id}`, { method: 'DELETE' });
        if (res.ok) {
          router.push('/lessons');
          router.refresh();
        }
      }}
    >
      Delete lesson
    </button>
  );
}
