import {
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  Injector,
  computed,
  effect,
  forwardRef,
  inject,
  input,
  signal,
  viewChild,
} from '@angular/core';
import {
  AbstractControl,
  ControlValueAccessor,
  NG_VALIDATORS,
  NG_VALUE_ACCESSOR,
  NgControl,
  ValidationErrors,
  Validator,
} from '@angular/forms';
import type { Subscription } from 'rxjs';
import { ErrorStateMatcher } from '@angular/material/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput, MatInputModule } from '@angular/material/input';
import { fieldErrorMessage } from './field-error-message';
import { formatQuantity } from './format-quantity';
import { parseQuantity, type QuantityUnit } from './parse-quantity';
import { toUnitText } from './to-unit-text';

/**
 * A unit-aware number input: the user types `45 mm`, `0.2 in` or a bare number in the field's
 * display unit (`bare`); the form control holds the SI value (null when empty). Shows the value it
 * read ("= 0.045 m") and says what is wrong when the text cannot be read, is out of range, or the
 * form has put an error on the control (a cross-field rule).
 */
@Component({
  selector: 'app-quantity-field',
  imports: [MatFormFieldModule, MatInputModule],
  template: `
    <mat-form-field appearance="outline" subscriptSizing="dynamic">
      <mat-label>{{ label() }}</mat-label>
      <input
        matInput
        [value]="text()"
        [disabled]="disabled()"
        [errorStateMatcher]="matcher"
        [attr.aria-describedby]="null"
        (input)="typed($any($event.target).value)"
        (blur)="blurred()"
        autocomplete="off"
        spellcheck="false"
      />
      @if (reading(); as r) {
        <span matTextSuffix class="reading" aria-hidden="true">{{ r }}</span>
      }
      @if (message(); as m) {
        <mat-error>{{ m }}</mat-error>
      } @else if (hint()) {
        <mat-hint>{{ hint() }}</mat-hint>
      }
    </mat-form-field>
  `,
  styles: `
    :host {
      display: block;
    }
    mat-form-field {
      width: 100%;
    }
    .reading {
      color: var(--mat-sys-on-surface-variant);
      font-size: 0.85em;
      white-space: nowrap;
      padding-inline-start: 0.5em;
    }
  `,
  providers: [
    { provide: NG_VALUE_ACCESSOR, useExisting: forwardRef(() => QuantityField), multi: true },
    { provide: NG_VALIDATORS, useExisting: forwardRef(() => QuantityField), multi: true },
  ],
  host: { '[attr.data-testid]': 'testId()' },
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class QuantityField implements ControlValueAccessor, Validator {
  private readonly injector = inject(Injector);

  readonly label = input.required<string>();
  /** What the value means and its typical range, under the field. */
  readonly hint = input('');
  /** The stored unit (SI; degrees for angles). */
  readonly unit = input.required<QuantityUnit>();
  /** The unit a bare number is read in and values are shown in, e.g. `mm`. */
  readonly bare = input<string | undefined>(undefined);
  /** Allowed range in the stored unit, inclusive. */
  readonly min = input<number | undefined>(undefined);
  readonly max = input<number | undefined>(undefined);
  /** Whether the range minimum itself is refused (a count of turns above 0). */
  readonly minExclusive = input(false);

  protected readonly text = signal('');
  protected readonly disabled = signal(false);
  private readonly touched = signal(false);
  /** The parent control's errors other than this field's own, e.g. a cross-field rule. */
  private readonly outerErrors = signal<ValidationErrors | null>(null);
  private readonly controlName = signal<string | null>(null);
  protected readonly testId = computed(() => {
    const name = this.controlName();
    return name ? `field-${name}` : null;
  });

  private readonly parsed = computed(() => {
    const text = this.text().trim();
    if (text === '') return { value: null as number | null };
    return parseQuantity(text, { unit: this.unit(), bare: this.bare() });
  });

  /** This field's own problem: unreadable text or a value out of range. */
  private readonly ownError = computed(() => {
    const parsed = this.parsed();
    if ('error' in parsed) return parsed.error;
    if (parsed.value === null) return null;
    return this.rangeError(parsed.value);
  });

  /**
   * What the field says: its own problem once the user has left it; an error the form set on
   * purpose (`geometry`: a cross-field rule) at once; the form's validators once touched.
   */
  protected readonly message = computed(() => {
    const outer = this.outerErrors();
    if (this.touched()) return this.ownError() ?? fieldErrorMessage(outer);
    const geometry = outer?.['geometry'];
    return typeof geometry === 'string' ? geometry : null;
  });

  protected readonly reading = computed(() => {
    const parsed = this.parsed();
    if (!('value' in parsed) || parsed.value === null) return null;
    const unit = this.unit();
    const shown = Number(parsed.value.toPrecision(6));
    return unit === '1' ? `= ${shown}` : `= ${shown} ${unit === 'deg' ? '°' : unit}`;
  });

  protected readonly matcher: ErrorStateMatcher = {
    isErrorState: () => this.message() !== null,
  };

  private readonly matInput = viewChild.required(MatInput);

  private onChange: (value: number | null) => void = () => undefined;
  private onTouched: () => void = () => undefined;

  constructor() {
    inject(DestroyRef).onDestroy(() => {
      this.destroyed = true;
      this.subscription?.unsubscribe();
    });
    // MatInput refreshes its error state only for an input with its own form control.
    effect(() => {
      this.message();
      this.matInput().updateErrorState();
    });
  }

  /** The control this field edits, met when the forms API first validates through it. */
  private boundControl: AbstractControl | null = null;
  private subscription: Subscription | null = null;
  private destroyed = false;

  private bind(control: AbstractControl): void {
    if (this.destroyed) return;
    this.boundControl = control;
    // Looked up late: NgControl depends on this accessor, so it cannot be injected in the field.
    const ngControl = this.injector.get(NgControl, null, { self: true, optional: true });
    const name = ngControl?.name;
    this.controlName.set(name === null || name === undefined ? null : String(name));
    const sync = () => {
      const others = { ...(control.errors ?? {}) };
      delete others['quantity'];
      this.outerErrors.set(Object.keys(others).length ? others : null);
      this.touched.set(control.touched);
    };
    sync();
    this.subscription?.unsubscribe();
    this.subscription = control.events.subscribe(sync);
  }

  writeValue(value: number | null | undefined): void {
    const current = this.parsed();
    // Keep what the user typed ("0.2 in") when the form writes back the value it came to.
    if ('value' in current && current.value === (value ?? null)) return;
    this.text.set(value === null || value === undefined ? '' : this.display(value));
  }

  registerOnChange(fn: (value: number | null) => void): void {
    this.onChange = fn;
    // A disabled control is never validated: bind once the forms API has set the control up.
    queueMicrotask(() => {
      const control = this.injector.get(NgControl, null, { self: true, optional: true })?.control;
      if (control && control !== this.boundControl) this.bind(control);
    });
  }

  registerOnTouched(fn: () => void): void {
    this.onTouched = fn;
  }

  setDisabledState(disabled: boolean): void {
    this.disabled.set(disabled);
  }

  validate(control: AbstractControl): ValidationErrors | null {
    if (control !== this.boundControl) this.bind(control);
    const error = this.ownError();
    return error ? { quantity: error } : null;
  }

  protected typed(text: string): void {
    this.text.set(text);
    const parsed = this.parsed();
    this.onChange('value' in parsed ? parsed.value : null);
  }

  protected blurred(): void {
    this.touched.set(true);
    this.onTouched();
  }

  /** The value in the display unit, e.g. 0.045 m → "45 mm". */
  private display(value: number): string {
    const bare = this.bare();
    const unit = this.unit();
    if (unit === '1') return String(Number(value.toPrecision(12)));
    return toUnitText(value, unit, bare);
  }

  private rangeError(value: number): string | null {
    const min = this.min();
    const max = this.max();
    const unit = this.unit();
    const show = (v: number) => formatQuantity(v, unit, { digits: 4, trim: true });
    const low = min !== undefined && (this.minExclusive() ? value <= min : value < min);
    const high = max !== undefined && value > max;
    if (!low && !high) return null;
    if (min !== undefined && max !== undefined) {
      const from = this.minExclusive() ? `above ${show(min)}` : `from ${show(min)}`;
      return `Allowed: ${from} to ${show(max)}`;
    }
    if (low && min !== undefined) {
      return this.minExclusive() ? `Must be above ${show(min)}` : `Must be at least ${show(min)}`;
    }
    return `Must be at most ${show(max as number)}`;
  }
}
