import { describe, expect, it } from 'vitest';
import { countdownMark, formatCountdown, secondsLeft, spokenCountdown } from './countdown';

describe('secondsLeft', () => {
  const until = '2027-03-14T10:10:00Z';
  it('rounds a part second up, so the timer shows 0:00 only when the hold is really over', () => {
    expect(secondsLeft(until, Date.parse('2027-03-14T10:00:00.500Z'))).toBe(600);
    expect(secondsLeft(until, Date.parse('2027-03-14T10:09:59.999Z'))).toBe(1);
  });
  it('never goes below zero', () => {
    expect(secondsLeft(until, Date.parse('2027-03-14T10:30:00Z'))).toBe(0);
  });
  it('measures instants, whatever offset the hold was written with', () => {
    expect(secondsLeft('2027-03-14T04:10:00-06:00', Date.parse('2027-03-14T10:05:00Z'))).toBe(300);
  });
});

describe('formatCountdown', () => {
  it('writes minutes and two-digit seconds', () => {
    expect(formatCountdown(600)).toBe('10:00');
    expect(formatCountdown(545)).toBe('9:05');
    expect(formatCountdown(59)).toBe('0:59');
    expect(formatCountdown(0)).toBe('0:00');
    expect(formatCountdown(-3)).toBe('0:00');
  });
});

describe('spokenCountdown', () => {
  it('says minutes and seconds in words, singular where one', () => {
    expect(spokenCountdown(545)).toBe('9 minutes 5 seconds');
    expect(spokenCountdown(60)).toBe('1 minute');
    expect(spokenCountdown(61)).toBe('1 minute 1 second');
    expect(spokenCountdown(45)).toBe('45 seconds');
    expect(spokenCountdown(0)).toBe('0 seconds');
  });
});

describe('countdownMark', () => {
  it('names the last mark passed, so each is announced once', () => {
    expect(countdownMark(600)).toBeNull();
    expect(countdownMark(300)).toBe(300);
    expect(countdownMark(200)).toBe(300);
    expect(countdownMark(120)).toBe(120);
    expect(countdownMark(30)).toBe(60);
  });
});
