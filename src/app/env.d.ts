/// <reference types="vite/client" />
// Vite's additions to import.meta (glob imports of the bundled demo files, worker URLs).
