import { useNavigation } from 'react-router-dom';

/** A thin bar under the top bar while the next page loads its code and data. */
export function NavigationProgress() {
  const navigation = useNavigation();
  if (navigation.state === 'idle') return null;
  return (
    <div role="progressbar" aria-label="Loading the page" className="no-print fixed inset-x-0 top-0 z-40 h-1 overflow-hidden bg-brand-light">
      <div className="h-full w-1/3 animate-[ql-progress_1.1s_ease-in-out_infinite] bg-brand" />
    </div>
  );
}
