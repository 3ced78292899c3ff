import { useNavigation } from 'react-router-dom';

/** A thin bar along the top while the next page's data loads, so a click never seems ignored. */
export function NavigationProgress() {
  const navigation = useNavigation();
  if (navigation.state === 'idle') return null;
  return (
    <div
      role="progressbar"
      aria-label="Loading the page"
      className="fixed inset-x-0 top-0 z-50 h-1 animate-pulse bg-caution-500 print:hidden"
    />
  );
}
