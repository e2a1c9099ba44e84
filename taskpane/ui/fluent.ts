/**
 * Registers the Fluent UI web components the pane uses and applies the Fluent light theme,
 * so the pane looks like the rest of Office. Each define module registers one element; the
 * theme goes into a constructed style sheet, which the page's content security policy allows.
 */
import { setTheme } from '@fluentui/web-components';
import { webLightTheme } from '@fluentui/tokens';
import '@fluentui/web-components/button.js';
import '@fluentui/web-components/checkbox.js';
import '@fluentui/web-components/divider.js';
import '@fluentui/web-components/dropdown.js';
import '@fluentui/web-components/field.js';
import '@fluentui/web-components/listbox.js';
import '@fluentui/web-components/message-bar.js';
import '@fluentui/web-components/option.js';
import '@fluentui/web-components/progress-bar.js';
import '@fluentui/web-components/radio.js';
import '@fluentui/web-components/radio-group.js';
import '@fluentui/web-components/text-input.js';

let themed = false;

/** Applies the Fluent light theme once. */
export function useFluentTheme(): void {
  if (themed) return;
  themed = true;
  setTheme(webLightTheme);
}
