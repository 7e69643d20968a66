import { Platform } from 'react-native';

type AudioContextCtor = new () => AudioContext;
let context: AudioContext | null = null;

function audioContext(): AudioContext | null {
  if (Platform.OS !== 'web' || typeof window === 'undefined') return null;
  const Ctor = (window.AudioContext ?? (window as unknown as { webkitAudioContext?: AudioContextCtor }).webkitAudioContext) as AudioContextCtor | undefined;
  if (!Ctor) return null;
  try {
    context ??= new Ctor();
    return context;
  } catch {
    return null;
  }
}

/** Call from a tap (browsers only allow sound after one), so later cues can play. */
export function unlockCues(): void {
  const ctx = audioContext();
  if (ctx && ctx.state === 'suspended') void ctx.resume().catch(() => undefined);
}

/** A short tone and a buzz where the device allows: the end of a block or a rest. Never throws. */
export function playCue(kind: 'step' | 'done'): void {
  const ctx = audioContext();
  if (ctx) {
    try {
      const osc = ctx.createOscillator();
      const gain = ctx.createGain();
      osc.frequency.value = kind === 'done' ? 660 : 880;
      gain.gain.setValueAtTime(0.15, ctx.currentTime);
      gain.gain.exponentialRampToValueAtTime(0.001, ctx.currentTime + 0.6);
      osc.connect(gain).connect(ctx.destination);
      osc.start();
      osc.stop(ctx.currentTime + 0.6);
    } catch {
      // Sound is a courtesy; the countdown on screen is the cue that counts.
    }
  }
  const nav = typeof navigator === 'undefined' ? null : navigator;
  if (nav && typeof nav.vibrate === 'function') {
    try {
      nav.vibrate(kind === 'done' ? [200, 100, 200] : 200);
    } catch {
      // Some browsers refuse vibration without a recent tap.
    }
  }
}
