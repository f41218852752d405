import { ChangeDetectionStrategy, Component } from '@angular/core';
import { RouterOutlet } from '@angular/router';
import { AppToolbar } from './shell/app-toolbar';

@Component({
  selector: 'app-root',
  imports: [AppToolbar, RouterOutlet],
  template: `
    <app-toolbar />
    <router-outlet />
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class App {}
