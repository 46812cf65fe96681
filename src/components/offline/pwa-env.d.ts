/// <reference types="vite-plugin-pwa/react" />
/// <reference types="vite-plugin-pwa/client" />
