import { TestBed } from '@angular/core/testing';

import { PREFERS_DARK_QUERY, THEME_STORAGE, THEME_STORAGE_KEY, ThemeService, ThemeStorage } from './theme';

/** A media query whose `matches` the test flips, firing `change` like a browser would. */
class FakeDarkQuery {
  matches: boolean;
  private readonly listeners = new Set<(event: MediaQueryListEvent) => void>();

  constructor(matches: boolean) {
    this.matches = matches;
  }

  addEventListener(_type: 'change', listener: (event: MediaQueryListEvent) => void): void {
    this.listeners.add(listener);
  }

  removeEventListener(_type: 'change', listener: (event: MediaQueryListEvent) => void): void {
    this.listeners.delete(listener);
  }

  systemSwitchesTo(dark: boolean): void {
    this.matches = dark;
    this.listeners.forEach((listener) => listener({ matches: dark } as MediaQueryListEvent));
  }
}

class MemoryStorage implements ThemeStorage {
  readonly items = new Map<string, string>();

  getItem(key: string): string | null {
    return this.items.get(key) ?? null;
  }

  setItem(key: string, value: string): void {
    this.items.set(key, value);
  }

  removeItem(key: string): void {
    this.items.delete(key);
  }
}

describe('ThemeService', () => {
  let storage: MemoryStorage;
  let darkQuery: FakeDarkQuery;
  const root = document.documentElement;

  function createService(): ThemeService {
    TestBed.configureTestingModule({
      providers: [
        { provide: THEME_STORAGE, useValue: storage },
        { provide: PREFERS_DARK_QUERY, useValue: darkQuery as unknown as MediaQueryList },
      ],
    });
    const service = TestBed.inject(ThemeService);
    TestBed.tick();
    return service;
  }

  beforeEach(() => {
    storage = new MemoryStorage();
    darkQuery = new FakeDarkQuery(false);
  });

  afterEach(() => root.classList.remove('kx-theme-light', 'kx-theme-dark'));

  it('follows a light system setting until the reader chooses', () => {
    const theme = createService();
    expect(theme.scheme()).toBe('light');
    expect(theme.followsSystem()).toBeTrue();
    expect(root.classList).toContain('kx-theme-light');
  });

  it('follows a dark system setting and applies it to the page', () => {
    darkQuery = new FakeDarkQuery(true);
    createService();
    expect(root.classList).toContain('kx-theme-dark');
    expect(root.classList).not.toContain('kx-theme-light');
    expect(getComputedStyle(root).colorScheme).toBe('dark');
  });

  it('switches when the system setting changes', () => {
    const theme = createService();
    darkQuery.systemSwitchesTo(true);
    TestBed.tick();
    expect(theme.scheme()).toBe('dark');
    expect(root.classList).toContain('kx-theme-dark');
  });

  it('toggles, applies and remembers the choice', () => {
    const theme = createService();
    theme.toggle();
    TestBed.tick();
    expect(theme.scheme()).toBe('dark');
    expect(theme.followsSystem()).toBeFalse();
    expect(root.classList).toContain('kx-theme-dark');
    expect(storage.getItem(THEME_STORAGE_KEY)).toBe('dark');
  });

  it('restores a remembered choice over the system setting', () => {
    storage.setItem(THEME_STORAGE_KEY, 'light');
    darkQuery = new FakeDarkQuery(true);
    const theme = createService();
    expect(theme.scheme()).toBe('light');
    expect(root.classList).toContain('kx-theme-light');
  });

  it('keeps a chosen theme when the system setting changes', () => {
    const theme = createService();
    theme.choose('light');
    darkQuery.systemSwitchesTo(true);
    TestBed.tick();
    expect(theme.scheme()).toBe('light');
  });

  it('forgets the choice when asked to follow the system again', () => {
    darkQuery = new FakeDarkQuery(true);
    const theme = createService();
    theme.choose('light');
    theme.followSystem();
    TestBed.tick();
    expect(theme.scheme()).toBe('dark');
    expect(storage.getItem(THEME_STORAGE_KEY)).toBeNull();
  });

  it('ignores an unrecognised stored value', () => {
    storage.setItem(THEME_STORAGE_KEY, 'sepia');
    const theme = createService();
    expect(theme.followsSystem()).toBeTrue();
    expect(theme.scheme()).toBe('light');
  });
});
