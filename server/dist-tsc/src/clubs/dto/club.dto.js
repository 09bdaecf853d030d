export {};
//# sourceMappingURL=club.dto.js.map