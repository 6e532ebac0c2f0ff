/// <reference types="astro/client" />
/// <reference types="svelte" />
