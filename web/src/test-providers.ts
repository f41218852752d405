import { MATERIAL_ANIMATIONS } from '@angular/material/core';

// Component tests run without Material's animations: the harnesses need not wait for them.
export default [{ provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } }];
