// The photos feature's public module: other features import it only from here.
export { photoQueries } from './api/photo-queries';
export { PhotoGallery } from './components/photo-gallery';
export { kindLabelsForStaff } from './components/photo-labels';
export { PhotoUploader } from './components/photo-uploader';
