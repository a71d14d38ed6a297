import { idParams, route } from '@/lib/api/route';
import { retire } from '../../retire-profile';

export const runtime = 'nodejs';

export const POST = route({ roles: ['admin'], params: idParams }, async ({ user, params }) => retire(user, params.id));
