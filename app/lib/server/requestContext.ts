import 'server-only';
import { getAppConfig } from '../appConfig';
import { clientAddressFrom } from '../clientAddress';

export function clientAddressOf(request: Request): string {
  return clientAddressFrom(request.headers, getAppConfig().trustProxy);
}

export function publicLink(path: string): string {
  return `${getAppConfig().publicUrl}${path}`;
}
