// The strand tests feature's public module: other features import it only from here.
export { listStrandTests, strandTestsShowingPhoto } from './strand-tests.repository';
