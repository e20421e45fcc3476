// Expo's Metro config, with zod's message tables cut to English (see scripts/metro/zod-locales-en.js).
const path = require('node:path');
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
const ZOD_LOCALES = /[\\/]zod[\\/]v4[\\/]locales[\\/]index\.c?js$/;
const ENGLISH_ONLY = path.join(__dirname, 'scripts', 'metro', 'zod-locales-en.js');

config.resolver.resolveRequest = (context, moduleName, platform) => {
  const resolved = context.resolveRequest(context, moduleName, platform);
  if (resolved.type === 'sourceFile' && ZOD_LOCALES.test(resolved.filePath)) return { type: 'sourceFile', filePath: ENGLISH_ONLY };
  return resolved;
};

// A module runs when its export is first used, not when the bundle starts: the sign-in screen then
// evaluates only what it draws (Metro's inline requires; side-effect imports still run in order).
const expoTransformOptions = config.transformer.getTransformOptions;
config.transformer.getTransformOptions = async (...args) => {
  const options = await expoTransformOptions(...args);
  return { ...options, transform: { ...options.transform, inlineRequires: true } };
};

module.exports = config;
