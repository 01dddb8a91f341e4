// Placeholder until the lab lands: one diagram's 3D workspace.
export default function DiagramPage() {
  return <p>The diagram workspace is on its way.</p>;
}
