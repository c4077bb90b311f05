/** Imported before functions.ts: puts a stub `CustomFunctions` global in place first. */
import { installCustomFunctionsStub } from './customFunctionsStub';

export const stub = installCustomFunctionsStub();
