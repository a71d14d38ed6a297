export default function Home() {
  return <main className="p-8 text-2xl font-semibold">Arcline</main>;
}
