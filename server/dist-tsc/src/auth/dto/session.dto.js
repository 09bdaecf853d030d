export {};
//# sourceMappingURL=session.dto.js.map