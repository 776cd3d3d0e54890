/** What an app knows about a media asset for one locale; the document itself holds only the id. */
export interface PanelMedia {
  src: string;
  srcSet?: string;
  sizes?: string;
  /** The asset's alt text in the locale being shown. */
  alt: string;
  credit?: string;
  width?: number;
  height?: number;
}

/** Studio and kiosk each supply their own: the studio points at the API, the kiosk at its offline store. */
export type ResolveMedia = (mediaId: string) => PanelMedia | null;
