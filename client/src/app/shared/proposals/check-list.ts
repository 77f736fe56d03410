import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';

import { CheckResult, CheckStatus } from './proposal';

const STATUS_WORDS: Readonly<Record<CheckStatus, string>> = { pass: 'passed', warn: 'warning', fail: 'failed' };
const STATUS_ICONS: Readonly<Record<CheckStatus, string>> = { pass: 'ok', warn: 'caution', fail: 'error' };

/** A check's numbers as `label: value` pairs; camelCase keys become words. */
export function checkNumbers(details: Readonly<Record<string, unknown>> | undefined): { label: string; value: string }[] {
  return Object.entries(details ?? {})
    .filter(([, value]) => value === null || ['number', 'string', 'boolean'].includes(typeof value))
    .map(([key, value]) => ({
      label: key.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase(),
      value: value === null ? '—' : typeof value === 'number' ? formatNumber(value) : String(value),
    }));
}

function formatNumber(value: number): string {
  if (Number.isInteger(value) && Math.abs(value) < 1e9) {
    return String(value);
  }
  return String(Number(value.toPrecision(6)));
}

/**
 * The automatic consistency checks of an item with the numbers each compared (SI units), worst
 * first. Before submission there are none, and it says so.
 */
@Component({
  selector: 'kx-check-list',
  imports: [MatIconModule],
  template: `
    @if (checks() === null) {
      <p class="kx-checks-none">{{ pendingText() }}</p>
    } @else if (sorted().length === 0) {
      <p class="kx-checks-none">No automatic check applies to this item.</p>
    } @else {
      <ul class="kx-checks" [attr.aria-label]="'Automatic checks: ' + summary()">
        @for (check of sorted(); track check.code + $index) {
          <li [class]="'kx-check-' + check.status">
            <mat-icon [svgIcon]="icons[check.status]" aria-hidden="true" />
            <div>
              <span class="kx-visually-hidden">{{ words[check.status] }}: </span>
              <strong class="kx-check-code">{{ check.code }}</strong> {{ check.message }}
              @if (check.numbers.length > 0) {
                <dl class="kx-check-numbers">
                  @for (n of check.numbers; track n.label) {
                    <div><dt>{{ n.label }}</dt><dd class="kx-numeric">{{ n.value }}</dd></div>
                  }
                </dl>
              }
            </div>
          </li>
        }
      </ul>
    }
  `,
  styles: `
    .kx-checks {
      margin: 0;
      padding: 0;
      list-style: none;
    }
    li {
      display: flex;
      gap: 0.5rem;
      align-items: flex-start;
      padding: 0.25rem 0;
    }
    mat-icon {
      flex: none;
      width: 20px;
      height: 20px;
    }
    .kx-check-pass mat-icon {
      color: var(--mat-sys-primary);
    }
    .kx-check-warn mat-icon {
      color: var(--mat-sys-tertiary);
    }
    .kx-check-fail mat-icon,
    .kx-check-fail .kx-check-code {
      color: var(--mat-sys-error);
    }
    .kx-check-code {
      font-weight: 600;
    }
    .kx-check-numbers {
      display: flex;
      flex-wrap: wrap;
      gap: 0 1rem;
      margin: 0.15rem 0 0;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
      div {
        display: flex;
        gap: 0.35rem;
      }
      dt::after {
        content: ':';
      }
      dd {
        margin: 0;
      }
    }
    .kx-checks-none {
      margin: 0;
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CheckList {
  readonly checks = input.required<readonly CheckResult[] | null>();
  readonly pendingText = input('The automatic checks run when the proposal is submitted.');

  protected readonly icons = STATUS_ICONS;
  protected readonly words = STATUS_WORDS;
  protected readonly sorted = computed(() => {
    const rank: Record<CheckStatus, number> = { fail: 0, warn: 1, pass: 2 };
    return [...(this.checks() ?? [])]
      .sort((a, b) => rank[a.status] - rank[b.status])
      .map((check) => ({ ...check, numbers: checkNumbers(check.details) }));
  });
  protected readonly summary = computed(() => {
    const list = this.checks() ?? [];
    const count = (status: CheckStatus) => list.filter((check) => check.status === status).length;
    return `${count('fail')} failed, ${count('warn')} warnings, ${count('pass')} passed`;
  });
}
