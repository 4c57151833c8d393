import base from "/work/main/playwright.config";
export default { ...base, webServer: undefined, use: { ...base.use, baseURL: process.env.BASE ?? "http://localhost:3400" } };
