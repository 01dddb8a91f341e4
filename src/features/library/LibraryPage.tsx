// Placeholder until the lab lands: the workspace's diagram library.
export default function LibraryPage() {
  return <p>The diagram library is on its way.</p>;
}
