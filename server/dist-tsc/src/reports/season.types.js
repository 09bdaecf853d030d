export {};
//# sourceMappingURL=season.types.js.map