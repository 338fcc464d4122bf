const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
// expo-sqlite's web worker loads a .wasm file; Metro must ship it as an asset.
config.resolver.assetExts.push('wasm');

module.exports = config;
