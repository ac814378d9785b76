/** The locker API's shapes, from the shared schemas the server validates with. */
export type {
  LockerFile,
  LockerFilePurpose,
  LockerItem,
  LockerItemInput,
  LockerItemListResponse as LockerItemsResponse,
} from '@gramwatt/shared';
export { lockerItemInputSchema } from '@gramwatt/shared';
