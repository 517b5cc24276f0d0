export function App() {
  return (
    <main>
      <h1>Halfwave</h1>
    </main>
  );
}
