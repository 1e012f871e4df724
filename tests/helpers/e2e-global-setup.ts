import { build } from 'vite'

/** The browser tests drive the built client served by the production server, as `npm start` does. */
export default async function setup() {
  await build({ logLevel: 'warn' })
}
