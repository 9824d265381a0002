/** The shop's street address on one line, as e-mails and calendar entries write it: "410 Foundry Street, Halvering, OH 43999". */
export function addressLine({ streetAddress, town, region, postalCode }: { streetAddress: string; town: string; region: string; postalCode: string }): string {
  return `${streetAddress}, ${town}, ${region} ${postalCode}`;
}
