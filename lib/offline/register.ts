// Native: the app is installed, so it loads offline without a service worker (see register.web.ts).
export {};
