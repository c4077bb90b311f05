/** The shared test support moved to test/support/; this re-export keeps older imports working. */
export * from '../support';
