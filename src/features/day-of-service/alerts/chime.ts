/**
 * A short two-note chime made with the Web Audio API (no sound file). Browsers let a page play sound only after
 * someone has used it, so the first tap or the "Turn on alerts" button calls `unlockChime`.
 */
let context: AudioContext | null = null;

function audio(): AudioContext | null {
  if (typeof window === 'undefined' || typeof window.AudioContext === 'undefined') return null;
  context ??= new window.AudioContext();
  return context;
}

export function unlockChime(): void {
  void audio()?.resume();
}

export function chime(): void {
  const ctx = audio();
  if (!ctx) return;
  const t0 = ctx.currentTime;
  [880, 1320].forEach((hz, i) => {
    const start = t0 + i * 0.2;
    const tone = ctx.createOscillator();
    const gain = ctx.createGain();
    tone.type = 'sine';
    tone.frequency.value = hz;
    gain.gain.setValueAtTime(0.0001, start);
    gain.gain.exponentialRampToValueAtTime(0.25, start + 0.02);
    gain.gain.exponentialRampToValueAtTime(0.0001, start + 0.6);
    tone.connect(gain).connect(ctx.destination);
    tone.start(start);
    tone.stop(start + 0.65);
  });
}
