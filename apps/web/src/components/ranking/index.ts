// The ranking picture's public surface, also for the bench (`@cairn/web/ranking-picture`; its checks
// read `@cairn/web/label-colours`), which times the picture in Chromium.
export { RankingPicture, SVG_CELL_LIMIT } from './RankingPicture';
export { gridLayout } from './grid-cells';
