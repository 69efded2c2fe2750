/**
 * Svelte components as the root type-check sees them when a test imports one (the renderer's own
 * tsconfig and svelte-check type them fully): a component taking props.
 */
declare module '*.svelte' {
  import type { Component } from 'svelte';
  const component: Component<Record<string, unknown>>;
  export default component;
}
