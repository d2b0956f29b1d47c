import type { RunningProduct } from './start-product.js';

const DEMO_ADMIN = { email: 'admin@demo.test', password: 'loftwright-demo' };

/**
 * The path of the newest link mailed to an address that contains `marker`, read from the local
 * outbox as the demo admin reads it. Only the path is kept: the mail names the server's public
 * host, the test browses the loopback address it started.
 */
export async function mailedLinkPath(
  product: RunningProduct,
  to: string,
  marker: string,
): Promise<string> {
  const signIn = await fetch(`${product.baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify(DEMO_ADMIN),
  });
  const { accessToken } = (await signIn.json()) as { accessToken: string };
  // The mail is sent after the registration answers; ask until it has arrived.
  for (;;) {
    const outbox = await fetch(`${product.baseUrl}/api/admin/outbox?pageSize=50`, {
      headers: { Authorization: `Bearer ${accessToken}` },
    });
    const { items } = (await outbox.json()) as { items: { to: string[]; text: string }[] };
    const mail = items.find((item) => item.to.includes(to) && item.text.includes(marker));
    const url = mail?.text.match(/https?:\/\/\S+/g)?.find((link) => link.includes(marker));
    if (url) {
      const { pathname, search } = new URL(url);
      return `${pathname}${search}`;
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}
