// The skin tests feature's public module: other features import it only from here.
export { assertSkinTestAllows, bookingSkinTestStates, skinTestVerdictFor, testedSittingStarts, testedSittings } from './skin-test-check.service';
