import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'gramwatt:isPublic';

/** Opens a route (or a controller) to requests without a session; every other route needs one. */
export const Public = () => SetMetadata(IS_PUBLIC_KEY, true);
