export * from '../../pwa/src/engine/index.js';
